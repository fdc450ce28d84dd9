// What the customer's quote page shows: the quote, the pieces, the yard, and where payment stands.
import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { customers, jobItems, jobs, payments, sections, yardSettings } from '@/db/schema';
import { quoteView } from './get-plan-quote';
import { depositDuePence, paidPence, paymentState } from './payment-state';
import { resolveQuoteToken } from './quote-links';

export async function getCustomerQuote({ token }: { token: string }) {
  const quote = await resolveQuoteToken(token);
  const db = await getDb();
  const [[job], [yard], items, ledger] = await Promise.all([
    db.select().from(jobs).where(eq(jobs.id, quote.jobId)),
    db.select().from(yardSettings).where(eq(yardSettings.id, 1)),
    db
      .select({
        section: sections.name,
        lengthMm: jobItems.lengthMm,
        quantity: jobItems.quantity,
        label: jobItems.label,
        toleranceMm: jobItems.toleranceMm,
      })
      .from(jobItems)
      .innerJoin(sections, eq(sections.id, jobItems.sectionId))
      .where(eq(jobItems.jobId, quote.jobId))
      .orderBy(asc(jobItems.position), asc(jobItems.id)),
    db.select().from(payments).where(eq(payments.jobId, quote.jobId)),
  ]);
  const [customer] = job.customerId
    ? await db.select().from(customers).where(eq(customers.id, job.customerId))
    : [];
  const paid = paidPence(ledger);
  const lastFailure = ledger
    .filter((p) => p.status === 'failed')
    .sort((a, b) => b.at.getTime() - a.at.getTime())[0];
  return {
    quote: quoteView(quote),
    expired: quote.validUntil <= new Date(),
    job: { reference: job.reference, customerName: job.customerName, status: job.status },
    canPayOnAccount: customer?.account === 'trade',
    yard: {
      name: yard.yardName,
      address: yard.yardAddress,
      vatNumber: yard.vatNumber,
      depositPercent: yard.depositPercent,
    },
    items,
    payment: {
      state: paymentState(quote, paid),
      paidPence: paid,
      balancePence: quote.grossPence - paid,
      depositDuePence: depositDuePence(quote, paid),
      lastFailure:
        lastFailure && !ledger.some((p) => p.status === 'succeeded' && p.at > lastFailure.at)
          ? lastFailure.note
          : null,
    },
    cutSheetUrl: `/api/quote-links/${token}/cut-sheet`,
  };
}
export type CustomerQuote = Awaited<ReturnType<typeof getCustomerQuote>>;
