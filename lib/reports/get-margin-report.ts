import 'server-only';
import { and, eq, gte, inArray, lt, ne } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, planBoards, plans, quotes, stockLengths } from '@/db/schema';
import { getSectionPencePerMetre } from '@/lib/stock/section-prices';
import { computeMarginReport, type QuotedPlanRow } from './margin-report';
import { rangeBounds, type ReportRange } from './report-range';

/** Quoted plans made in the range (not superseded or cancelled), their boards and what each cost. */
export async function getMarginReport(range: ReportRange) {
  const db = await getDb();
  const { start, end } = rangeBounds(range);
  const quoted = await db
    .select({
      planId: plans.id,
      jobReference: jobs.reference,
      customerName: jobs.customerName,
      netPence: quotes.netPence,
    })
    .from(quotes)
    .innerJoin(plans, eq(plans.id, quotes.planId))
    .innerJoin(jobs, eq(jobs.id, quotes.jobId))
    .where(
      and(
        ne(plans.status, 'superseded'),
        ne(jobs.status, 'cancelled'),
        gte(plans.createdAt, start),
        lt(plans.createdAt, end),
      ),
    )
    .orderBy(plans.createdAt);
  if (!quoted.length) return computeMarginReport([]);
  const [boards, perMetre] = await Promise.all([
    db
      .select({
        planId: planBoards.planId,
        sectionId: planBoards.sectionId,
        source: planBoards.source,
        lengthMm: planBoards.lengthMm,
        costPence: stockLengths.costPence,
        pricePence: stockLengths.pricePence,
      })
      .from(planBoards)
      .leftJoin(stockLengths, eq(stockLengths.id, planBoards.stockLengthId))
      .where(
        inArray(
          planBoards.planId,
          quoted.map((q) => q.planId),
        ),
      ),
    getSectionPencePerMetre(db),
  ]);
  const rows: QuotedPlanRow[] = quoted.map((q) => ({
    ...q,
    boards: boards
      .filter((b) => b.planId === q.planId)
      .map((b) => ({ ...b, costPerMetrePence: perMetre.get(b.sectionId) ?? 0 })),
  }));
  return computeMarginReport(rows);
}
