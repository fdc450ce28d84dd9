import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { stockLengths, stockMovements } from '@/db/schema';
import { notFound } from '@/lib/errors';
import type { StocktakeBody } from '@/lib/validations/stock';
import { applyStockMovement } from './apply-stock-movement';

/**
 * A stocktake: each counted length gets a movement of (counted − what the movements say is there),
 * so on-hand still equals the sum of its movements. Counting an unlimited length starts counting it.
 * Lengths whose count already matches get no movement.
 */
export async function takeStock({ body, userId }: { body: StocktakeBody; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const at = new Date();
    const movements = [];
    for (const { stockLengthId, counted } of body.counts) {
      const [length] = await tx
        .select()
        .from(stockLengths)
        .where(eq(stockLengths.id, stockLengthId))
        .for('update');
      if (!length) throw notFound(`Stock length ${stockLengthId}`);
      const [{ total }] = await tx
        .select({ total: sql<number>`coalesce(sum(${stockMovements.quantityDelta}), 0)::int` })
        .from(stockMovements)
        .where(eq(stockMovements.stockLengthId, stockLengthId));
      if (length.onHand === null)
        await tx.update(stockLengths).set({ onHand: total }).where(eq(stockLengths.id, stockLengthId));
      const delta = counted - total;
      if (delta === 0 && length.onHand !== null) continue;
      movements.push(
        await applyStockMovement(tx, {
          kind: 'stocktake',
          stockLengthId,
          quantityDelta: delta,
          userId,
          reason: body.reason,
          at,
        }),
      );
    }
    return movements;
  });
}
