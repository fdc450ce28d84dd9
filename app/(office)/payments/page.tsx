import type { Metadata } from 'next';
import { AccessDenied } from '@/components/layout/access-denied';
import { PaymentLedger } from '@/components/payments/payment-ledger';
import { QuoteStateTable } from '@/components/payments/quote-state-table';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { getPaymentsOverview } from '@/lib/quotes/get-payments-overview';

export const metadata: Metadata = { title: 'Payments' };
export const dynamic = 'force-dynamic';

export default async function PaymentsPage() {
  const user = await requirePageUser();
  if (!can(user.role, 'payments:read')) return <AccessDenied />;
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
        <Card className="overflow-x-auto">
          <h2 className="mb-3 text-xl font-bold">Payments ledger</h2>
          <PaymentLedger rows={overview.payments} />
        </Card>
      </div>
    </>
  );
}
