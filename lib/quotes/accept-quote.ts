// The customer accepts a quote from their link: a typed name, the non-returnable tick, and (trade
// accounts only) the choice to pay on account. Recorded with time and IP address; idempotent.
import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { customers, jobs, payments, plans, quotes } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { resolveQuoteToken } from './quote-links';

export async function acceptQuote({
  token,
  name,
  onAccount,
  ip,
  now = new Date(),
}: {
  token: string;
  name: string;
  onAccount: boolean;
  ip: string;
  now?: Date;
}) {
  const quote = await resolveQuoteToken(token, now);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(quotes).where(eq(quotes.id, quote.id)).for('update');
    if (current.acceptedAt)
      return { accepted: true, acceptedAt: current.acceptedAt.toISOString(), onAccount: current.onAccount };
    const [plan] = await tx.select().from(plans).where(eq(plans.id, current.planId));
    if (plan.status === 'superseded')
      throw new AppError('gone', 'The yard has re-planned this job; ask them for the new quote.');
    if (current.validUntil <= now)
      throw new AppError('gone', 'This quote is past its validity date. Ask the yard for a fresh quote.');
    const [job] = await tx.select().from(jobs).where(eq(jobs.id, current.jobId));
    if (job.status === 'cancelled') throw new AppError('gone', 'This job has been cancelled by the yard.');
    if (onAccount) {
      const [customer] = job.customerId
        ? await tx.select().from(customers).where(eq(customers.id, job.customerId))
        : [];
      if (customer?.account !== 'trade')
        throw new AppError(
          'invalid',
          'Only trade accounts can accept on account; please pay a deposit or in full.',
        );
      await tx.insert(payments).values({
        at: now,
        jobId: job.id,
        quoteId: current.id,
        kind: 'on_account',
        status: 'succeeded',
        amountPence: 0,
        byName: name,
        note: `On account, ${customer.creditDays ?? 30} days`,
      });
    }
    await tx
      .update(quotes)
      .set({ acceptedAt: now, acceptedName: name, acceptedIp: ip, onAccount })
      .where(eq(quotes.id, current.id));
    return { accepted: true, acceptedAt: now.toISOString(), onAccount };
  });
}
