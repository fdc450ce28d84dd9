import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import { formatCustomerDate } from '@/lib/format/customer-date';
import { formatPence } from '@/lib/format/money';
import type { PaymentsOverview } from '@/lib/quotes/get-payments-overview';
import { PAYMENT_STATE_LABEL } from '@/lib/quotes/payment-state';

export function QuoteStateTable({ rows }: { rows: PaymentsOverview['outstanding'] }) {
  if (!rows.length) return <p>None.</p>;
  return (
    <Table className="text-sm">
      <TableHead
        density="compact"
        columns={[
          'Quote',
          'Customer',
          'State',
          { label: 'Total', numeric: true },
          { label: 'Paid', numeric: true },
          { label: 'Balance', numeric: true },
          'Valid until',
        ]}
      />
      <tbody>
        {rows.map((r) => (
          <TableRow key={r.quoteId}>
            <Cell density="compact" className="font-semibold">
              {r.number}
            </Cell>
            <Cell density="compact">{r.customerName}</Cell>
            <Cell density="compact">{PAYMENT_STATE_LABEL[r.state]}</Cell>
            <Cell density="compact" numeric className="font-mono">
              {formatPence(r.grossPence)}
            </Cell>
            <Cell density="compact" numeric className="font-mono">
              {formatPence(r.paidPence)}
            </Cell>
            <Cell density="compact" numeric className="font-mono">
              {formatPence(r.balancePence)}
            </Cell>
            <Cell density="compact">{formatCustomerDate(r.validUntil)}</Cell>
          </TableRow>
        ))}
      </tbody>
    </Table>
  );
}
