// Reads what a plan's quote is priced from: its boards with their stock prices, the sections' rates,
// the job's customer and the yard's settings.
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { customers, jobs, planBoards, plans, sections, stockLengths, yardSettings } from '@/db/schema';
import { notFound } from '@/lib/errors';
import type { PriceQuoteInput, QuoteBoard, SectionRate } from './price-quote';

export async function loadQuoteInput(db: DbOrTx, planId: number) {
  const [plan] = await db.select().from(plans).where(eq(plans.id, planId));
  if (!plan) throw notFound('That plan');
  const [job] = await db.select().from(jobs).where(eq(jobs.id, plan.jobId));
  const [customer] = job.customerId
    ? await db.select().from(customers).where(eq(customers.id, job.customerId))
    : [];
  const [yard] = await db.select().from(yardSettings).where(eq(yardSettings.id, 1));
  const rows = await db
    .select({ board: planBoards, sectionName: sections.name, pricePence: stockLengths.pricePence })
    .from(planBoards)
    .innerJoin(sections, eq(sections.id, planBoards.sectionId))
    .leftJoin(stockLengths, eq(stockLengths.id, planBoards.stockLengthId))
    .where(eq(planBoards.planId, planId))
    .orderBy(asc(planBoards.boardNo));
  const boards: QuoteBoard[] = rows.map(({ board, sectionName, pricePence }) => ({
    sectionId: board.sectionId,
    sectionName,
    source: board.source,
    lengthMm: board.lengthMm,
    pricePence: board.source === 'stock' ? (pricePence ?? 0) : 0,
    // A board sold full length goes out whole: no cut to charge.
    cuts: board.fullLength ? 0 : (board.pieces as unknown[]).length,
  }));
  const sectionIds = [...new Set(boards.map((b) => b.sectionId))];
  const lengths = sectionIds.length
    ? await db
        .select()
        .from(stockLengths)
        .where(and(inArray(stockLengths.sectionId, sectionIds), eq(stockLengths.active, true)))
    : [];
  const sectionRates = new Map<number, SectionRate>();
  for (const s of lengths) {
    const best = sectionRates.get(s.sectionId);
    // Cheapest per metre: compare price/length as cross products to stay in whole numbers.
    if (!best || s.pricePence * best.lengthMm < best.pricePence * s.lengthMm) {
      sectionRates.set(s.sectionId, { pricePence: s.pricePence, lengthMm: s.lengthMm });
    }
  }
  const account = customer?.account ?? 'retail';
  const input: PriceQuoteInput = {
    boards,
    sectionRates,
    perCutPence: yard.perCutChargePence,
    offcutRatePercent: yard.offcutRatePercent,
    deliveryPence: job.deliveryChargePence,
    minimumChargePence: yard.minimumChargePence,
    account,
    discountPercent: account === 'trade' ? (customer?.discountPercent ?? 0) : 0,
    vatRateBasisPoints: yard.vatRateBasisPoints,
    depositPercent: yard.depositPercent,
    region: yard.region,
  };
  return { plan, job, customer: customer ?? null, yard, input };
}
