// The owner's view of money: the payments ledger, balances outstanding on accepted quotes, quotes
// awaiting acceptance, quotes that expired unaccepted, and cancelled jobs still holding the
// customer's money (to refund). Only quotes of live plans count.
import 'server-only';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, payments, plans, quotes } from '@/db/schema';
import { paidPence, paymentState } from './payment-state';

export async function getPaymentsOverview(now = new Date()) {
  const db = await getDb();
  const paidSum = sql<number>`sum(${payments.amountPence})::int`;
  const [ledger, live, refundsDue] = await Promise.all([
    db
      .select({ payment: payments, reference: jobs.reference, customerName: jobs.customerName })
      .from(payments)
      .innerJoin(jobs, eq(jobs.id, payments.jobId))
      .orderBy(desc(payments.at))
      .limit(200),
    db
      .select({
        quote: quotes,
        reference: jobs.reference,
        customerName: jobs.customerName,
        jobStatus: jobs.status,
      })
      .from(quotes)
      .innerJoin(plans, eq(plans.id, quotes.planId))
      .innerJoin(jobs, eq(jobs.id, quotes.jobId))
      .where(inArray(plans.status, ['planned', 'released', 'done'])),
    db
      .select({
        jobId: jobs.id,
        reference: jobs.reference,
        customerName: jobs.customerName,
        paidPence: paidSum,
      })
      .from(payments)
      .innerJoin(jobs, eq(jobs.id, payments.jobId))
      .where(and(eq(jobs.status, 'cancelled'), eq(payments.status, 'succeeded')))
      .groupBy(jobs.id, jobs.reference, jobs.customerName)
      .having(sql`${paidSum} > 0`)
      .orderBy(jobs.reference),
  ]);
  const jobIds = [...new Set(live.map((q) => q.quote.jobId))];
  const allPayments = jobIds.length
    ? await db.select().from(payments).where(inArray(payments.jobId, jobIds))
    : [];
  const rows = live
    .filter((q) => q.jobStatus !== 'cancelled')
    .map(({ quote, reference, customerName }) => {
      const paid = paidPence(allPayments.filter((p) => p.jobId === quote.jobId));
      return {
        quoteId: quote.id,
        number: quote.number,
        reference,
        customerName,
        account: quote.account,
        grossPence: quote.grossPence,
        paidPence: paid,
        balancePence: quote.grossPence - paid,
        validUntil: quote.validUntil.toISOString(),
        state: paymentState(quote, paid),
      };
    });
  return {
    payments: ledger.map(({ payment, reference, customerName }) => ({
      ...payment,
      at: payment.at.toISOString(),
      reference,
      customerName,
    })),
    outstanding: rows.filter((r) => r.state !== 'not_accepted' && r.balancePence > 0),
    awaitingAcceptance: rows.filter((r) => r.state === 'not_accepted' && new Date(r.validUntil) > now),
    expired: rows.filter((r) => r.state === 'not_accepted' && new Date(r.validUntil) <= now),
    refundsDue,
  };
}
export type PaymentsOverview = Awaited<ReturnType<typeof getPaymentsOverview>>;
