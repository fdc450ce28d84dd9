// The quote of a plan: made (and numbered) the first time it is asked for, then kept as issued.
// An accepted quote is never re-priced; re-planning makes a new plan and so a new quote version.
import { eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { lockCounter } from '@/db/counter-lock';
import { quotes, type Quote } from '@/db/schema';
import { loadQuoteInput } from './load-quote-input';
import { priceQuote } from './price-quote';
import type { QuoteLine } from './quote-shapes';

const DAY_MS = 86_400_000;

export async function getPlanQuote(db: DbOrTx, { planId, now = new Date() }: { planId: number; now?: Date }) {
  const [existing] = await db.select().from(quotes).where(eq(quotes.planId, planId));
  if (existing) return existing;
  const { job, yard, input } = await loadQuoteInput(db, planId);
  const figures = priceQuote(input);
  // Versions count up per job; the counter lock keeps two instances from numbering two plans alike.
  const created = await db.transaction(async (tx) => {
    await lockCounter(tx, 'quote-number');
    const [{ version }] = await tx
      .select({ version: sql<number>`coalesce(max(${quotes.version}), 0)::int + 1` })
      .from(quotes)
      .where(eq(quotes.jobId, job.id));
    const [row] = await tx
      .insert(quotes)
      .values({
        planId,
        jobId: job.id,
        number: quoteNumber(job.reference, version),
        version,
        ...figures,
        validUntil: new Date(now.getTime() + yard.quoteValidityDays * DAY_MS),
      })
      .onConflictDoNothing({ target: quotes.planId })
      .returning();
    return row;
  });
  // Two first requests at once: the other one made it.
  return created ?? (await db.select().from(quotes).where(eq(quotes.planId, planId)))[0];
}

/** Our quote numbers: the job reference and the version, e.g. J-1004/Q2. */
export const quoteNumber = (reference: string, version: number) => `${reference}/Q${version}`;

/** The quote as the API carries it on a plan. */
export function quoteView(quote: Quote) {
  return {
    id: quote.id,
    number: quote.number,
    version: quote.version,
    validUntil: quote.validUntil.toISOString(),
    lines: quote.lines as QuoteLine[],
    netPence: quote.netPence,
    vatPence: quote.vatPence,
    grossPence: quote.grossPence,
    vatRatePercent: quote.vatRateBasisPoints / 100,
    account: quote.account,
    depositPence: quote.depositPence,
    acceptedAt: quote.acceptedAt?.toISOString() ?? null,
    acceptedName: quote.acceptedName,
    onAccount: quote.onAccount,
  };
}
export type QuoteView = ReturnType<typeof quoteView>;
