import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import { formatPence } from '@/lib/format/money';
import type { PaymentsOverview } from '@/lib/quotes/get-payments-overview';

export function PaymentLedger({ rows }: { rows: PaymentsOverview['payments'] }) {
  if (!rows.length) return <p>No payments yet.</p>;
  return (
    <Table className="text-sm" data-testid="payment-ledger">
      <TableHead
        density="compact"
        columns={['When', 'Job', 'Customer', 'What', { label: 'Amount', numeric: true }, 'By', 'Note']}
      />
      <tbody>
        {rows.map((p) => (
          <TableRow key={p.id}>
            <Cell density="compact" className="whitespace-nowrap">
              {new Date(p.at).toLocaleString('en-GB')}
            </Cell>
            <Cell density="compact">{p.reference}</Cell>
            <Cell density="compact">{p.customerName}</Cell>
            <Cell density="compact">
              {p.kind.replace('_', ' ')}
              {p.status === 'failed' ? ' (failed)' : ''}
            </Cell>
            <Cell density="compact" numeric className="font-mono">
              {formatPence(p.amountPence)}
            </Cell>
            <Cell density="compact">{p.byName}</Cell>
            <Cell density="compact">{p.note}</Cell>
          </TableRow>
        ))}
      </tbody>
    </Table>
  );
}
