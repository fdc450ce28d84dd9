import type { Metadata } from 'next';
import { PaymentLedger } from '@/components/payments/payment-ledger';
import { RefundDueList } from '@/components/payments/refund-due-list';
import { QuoteStateTable } from '@/components/payments/quote-state-table';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getPaymentsOverview } from '@/lib/quotes/get-payments-overview';

export const metadata: Metadata = { title: 'Payments' };
export const dynamic = 'force-dynamic';

export default async function PaymentsPage() {
  await requirePageUser('payments:read');
  const overview = await getPaymentsOverview();
  const sections = [
    ['Balances outstanding', overview.outstanding],
    ['Quotes awaiting acceptance', overview.awaitingAcceptance],
    ['Expired quotes', overview.expired],
  ] as const;
  return (
    <>
      <PageHeader title="Payments" lead="What customers have paid, what they owe, and quotes still open." />
      <div className="space-y-6">
        {sections.map(([title, rows]) => (
          <Card key={title} className="overflow-x-auto">
            <h2 className="mb-3 text-xl font-bold">{title}</h2>
            <QuoteStateTable rows={rows} />
          </Card>
        ))}
        <Card>
          <h2 className="mb-3 text-xl font-bold">Cancelled jobs to refund</h2>
          <RefundDueList rows={overview.refundsDue} />
        </Card>
        <Card className="overflow-x-auto">
          <h2 className="mb-3 text-xl font-bold">Payments ledger</h2>
          <PaymentLedger rows={overview.payments} />
        </Card>
      </div>
    </>
  );
}
