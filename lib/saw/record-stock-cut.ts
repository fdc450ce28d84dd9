// A new stock board taken to the saw: one 'stock_cut' movement and one fewer on hand.
import { eq, sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import { sections, stockLengths, stockMovements } from '@/db/schema';
import { AppError } from '@/lib/errors';

type StockCut = {
  stockLengthId: number;
  sectionId: number;
  planId: number;
  jobId: number;
  userId: number;
  at: Date;
  reason: string;
  /** The operator has said the board is really in their hands though the count shows none. */
  boardThere?: boolean;
};

/** Marks the 409 that asks the operator whether a board the count says is gone is really there. */
export const BOARD_NOT_COUNTED = 'board_not_counted';

/**
 * Rule for a board the count says is not there (on hand already 0): the saw first asks the operator
 * to confirm the board is really in their hands (409 until `boardThere`). Once confirmed nothing goes
 * negative: the cut (−1) and a 'counted_short' row (+1) are written, so on hand stays 0 and still
 * equals the sum of the movements, and the owner's overview flags the length for a recount.
 * Unlimited lengths (on hand null) only get the cut row.
 */
export async function recordStockCut(tx: Tx, cut: StockCut): Promise<void> {
  const [stock] = await tx.select().from(stockLengths).where(eq(stockLengths.id, cut.stockLengthId));
  if (stock.onHand === 0 && !cut.boardThere) {
    const [section] = await tx.select().from(sections).where(eq(sections.id, stock.sectionId));
    throw new AppError(
      'conflict',
      `The stock count shows no ${stock.lengthMm} mm ${section.name} left. Is the board really in your hands?`,
      { reason: BOARD_NOT_COUNTED, lengthMm: stock.lengthMm, sectionName: section.name },
    );
  }
  const base = {
    at: cut.at,
    userId: cut.userId,
    sectionId: cut.sectionId,
    stockLengthId: stock.id,
    lengthMm: stock.lengthMm,
    planId: cut.planId,
    jobId: cut.jobId,
  };
  await tx.insert(stockMovements).values({
    ...base,
    kind: 'stock_cut',
    quantityDelta: -1,
    valuePence: stock.pricePence,
    reason: cut.reason,
  });
  if (stock.onHand === null) return;
  if (stock.onHand > 0) {
    await tx
      .update(stockLengths)
      .set({ onHand: sql`${stockLengths.onHand} - 1` })
      .where(eq(stockLengths.id, stock.id));
    return;
  }
  await tx.insert(stockMovements).values({
    ...base,
    kind: 'counted_short',
    quantityDelta: 1,
    reason: 'Cut at the saw though the count showed none: recount this length',
  });
}
