import type { Customer } from '@/db/schema';

export function CustomerTable({ customers }: { customers: Customer[] }) {
  if (!customers.length) return <p className="p-4">No customers match.</p>;
  return (
    <table className="w-full text-left text-sm" data-testid="customer-table">
      <thead className="bg-sand/40">
        <tr>
          {['Name', 'Contact', 'Phone', 'E-mail', 'Account', 'Terms'].map((h) => (
            <th key={h} className="px-3 py-2 font-semibold">
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {customers.map((c) => (
          <tr key={c.id} className="border-t border-sand">
            <td className="px-3 py-2 font-semibold">{c.name}</td>
            <td className="px-3 py-2">{c.contact}</td>
            <td className="px-3 py-2 whitespace-nowrap">{c.phone}</td>
            <td className="px-3 py-2">{c.email}</td>
            <td className="px-3 py-2">{c.account}</td>
            <td className="px-3 py-2">
              {c.account === 'trade' ? `${c.creditDays ?? 30} days, ${c.discountPercent} % off timber` : '—'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
