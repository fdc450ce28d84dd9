// A new stock board taken to the saw: one 'stock_cut' movement and one fewer on hand.
import { eq, sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import { stockLengths, stockMovements } from '@/db/schema';

type StockCut = {
  stockLengthId: number;
  sectionId: number;
  planId: number;
  jobId: number;
  userId: number;
  at: Date;
  reason: string;
};

/**
 * Rule for a board the count says is not there (on hand already 0): the cut is never refused (the
 * board is in the operator's hands), and nothing goes negative. Two rows are written: the cut (−1)
 * and a 'stocktake' correction (+1, "counted short"), so on hand stays 0 and still equals the sum of
 * the movements, and the stock page shows the length was miscounted. Unlimited lengths (on hand
 * null) only get the cut row.
 */
export async function recordStockCut(tx: Tx, cut: StockCut): Promise<void> {
  const [stock] = await tx.select().from(stockLengths).where(eq(stockLengths.id, cut.stockLengthId));
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
    kind: 'stocktake',
    quantityDelta: 1,
    reason: 'Counted short: a board was cut that the stock count did not show',
  });
}
