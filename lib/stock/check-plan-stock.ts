import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import { getDb, type Tx } from '@/db';
import { planBoards, plans, sections, stockLengths } from '@/db/schema';
import { notFound } from '@/lib/errors';

export type StockShortfall = {
  stockLengthId: number;
  sectionName: string;
  lengthMm: number;
  needed: number;
  onHand: number;
};

/**
 * Stock lengths a plan needs more of than the yard holds. Counts the plan's boards of new stock
 * still to cut (pending); unlimited lengths are never short. Shown before release.
 */
export async function checkPlanStock(
  { planId }: { planId: number },
  tx?: Tx,
): Promise<{ short: StockShortfall[] }> {
  const db = tx ?? (await getDb());
  const [plan] = await db.select({ id: plans.id }).from(plans).where(eq(plans.id, planId));
  if (!plan) throw notFound('That plan');
  const boards = await db
    .select({ stockLengthId: planBoards.stockLengthId })
    .from(planBoards)
    .where(
      and(eq(planBoards.planId, planId), eq(planBoards.source, 'stock'), eq(planBoards.status, 'pending')),
    );
  const needed = new Map<number, number>();
  for (const b of boards)
    if (b.stockLengthId) needed.set(b.stockLengthId, (needed.get(b.stockLengthId) ?? 0) + 1);
  if (needed.size === 0) return { short: [] };
  const lengths = await db
    .select({
      id: stockLengths.id,
      lengthMm: stockLengths.lengthMm,
      onHand: stockLengths.onHand,
      sectionName: sections.name,
    })
    .from(stockLengths)
    .innerJoin(sections, eq(sections.id, stockLengths.sectionId))
    .where(inArray(stockLengths.id, [...needed.keys()]));
  const short = lengths
    .filter((l) => l.onHand !== null && needed.get(l.id)! > l.onHand)
    .map((l) => ({
      stockLengthId: l.id,
      sectionName: l.sectionName,
      lengthMm: l.lengthMm,
      needed: needed.get(l.id)!,
      onHand: l.onHand!,
    }))
    .sort((a, b) => a.sectionName.localeCompare(b.sectionName) || a.lengthMm - b.lengthMm);
  return { short };
}
