import { formatPence } from '@/lib/format/money';
import type { PaymentsOverview } from '@/lib/quotes/get-payments-overview';
import { PaymentsTableHead } from './payments-table-head';

export function PaymentLedger({ rows }: { rows: PaymentsOverview['payments'] }) {
  if (!rows.length) return <p>No payments yet.</p>;
  return (
    <table className="w-full text-left text-sm" data-testid="payment-ledger">
      <PaymentsTableHead columns={['When', 'Job', 'Customer', 'What', 'Amount', 'By', 'Note']} />
      <tbody>
        {rows.map((p) => (
          <tr key={p.id} className="border-t border-sand">
            <td className="py-1.5 pr-3 whitespace-nowrap">{new Date(p.at).toLocaleString('en-GB')}</td>
            <td className="py-1.5 pr-3">{p.reference}</td>
            <td className="py-1.5 pr-3">{p.customerName}</td>
            <td className="py-1.5 pr-3">
              {p.kind.replace('_', ' ')}
              {p.status === 'failed' ? ' (failed)' : ''}
            </td>
            <td className="py-1.5 pr-3 font-mono">{formatPence(p.amountPence)}</td>
            <td className="py-1.5 pr-3">{p.byName}</td>
            <td className="py-1.5 pr-3">{p.note}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
