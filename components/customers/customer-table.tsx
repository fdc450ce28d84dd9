import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import type { Customer } from '@/db/schema';

export function CustomerTable({ customers }: { customers: Customer[] }) {
  if (!customers.length) return <p className="p-4">No customers match.</p>;
  return (
    <Table className="text-sm" data-testid="customer-table">
      <TableHead density="snug" columns={['Name', 'Contact', 'Phone', 'E-mail', 'Account', 'Terms']} />
      <tbody>
        {customers.map((c) => (
          <TableRow key={c.id}>
            <Cell density="snug" className="font-semibold">
              {c.name}
            </Cell>
            <Cell density="snug">{c.contact}</Cell>
            <Cell density="snug" className="whitespace-nowrap">
              {c.phone}
            </Cell>
            <Cell density="snug">{c.email}</Cell>
            <Cell density="snug">{c.account}</Cell>
            <Cell density="snug">
              {c.account === 'trade' ? `${c.creditDays ?? 30} days, ${c.discountPercent} % off timber` : '—'}
            </Cell>
          </TableRow>
        ))}
      </tbody>
    </Table>
  );
}
