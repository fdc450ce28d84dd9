/** The header row every table on the payments page shares. */
export function PaymentsTableHead({ columns }: { columns: string[] }) {
  return (
    <thead>
      <tr>
        {columns.map((h) => (
          <th key={h} className="py-1 pr-3 font-semibold">
            {h}
          </th>
        ))}
      </tr>
    </thead>
  );
}
