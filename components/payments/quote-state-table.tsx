import { formatPence } from '@/lib/format/money';
import type { PaymentsOverview } from '@/lib/quotes/get-payments-overview';
import { PAYMENT_STATE_LABEL } from '@/lib/quotes/payment-state';
import { formatCustomerDate } from '@/lib/format/customer-date';
import { PaymentsTableHead } from './payments-table-head';

export function QuoteStateTable({ rows }: { rows: PaymentsOverview['outstanding'] }) {
  if (!rows.length) return <p>None.</p>;
  return (
    <table className="w-full text-left text-sm">
      <PaymentsTableHead
        columns={['Quote', 'Customer', 'State', 'Total', 'Paid', 'Balance', 'Valid until']}
      />
      <tbody>
        {rows.map((r) => (
          <tr key={r.quoteId} className="border-t border-sand">
            <td className="py-1.5 pr-3 font-semibold">{r.number}</td>
            <td className="py-1.5 pr-3">{r.customerName}</td>
            <td className="py-1.5 pr-3">{PAYMENT_STATE_LABEL[r.state]}</td>
            <td className="py-1.5 pr-3 font-mono">{formatPence(r.grossPence)}</td>
            <td className="py-1.5 pr-3 font-mono">{formatPence(r.paidPence)}</td>
            <td className="py-1.5 pr-3 font-mono">{formatPence(r.balancePence)}</td>
            <td className="py-1.5 pr-3">{formatCustomerDate(r.validUntil)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
