import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import { stockLengths, stockMovements, type MovementKind } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';

/**
 * Records one change to a stock length's count and applies it to on-hand in the same transaction.
 * The count can never go below zero: the update only matches while on_hand + delta ≥ 0.
 * Unlimited lengths (on_hand null) keep null; the movement is still recorded.
 */
export async function applyStockMovement(
  tx: Tx,
  m: {
    kind: MovementKind;
    stockLengthId: number;
    quantityDelta: number;
    userId: number | null;
    reason: string;
    at?: Date;
    planId?: number | null;
    jobId?: number | null;
  },
) {
  const [length] = await tx.select().from(stockLengths).where(eq(stockLengths.id, m.stockLengthId));
  if (!length) throw notFound(`Stock length ${m.stockLengthId}`);
  if (length.onHand !== null) {
    const updated = await tx
      .update(stockLengths)
      .set({ onHand: sql`${stockLengths.onHand} + ${m.quantityDelta}` })
      .where(and(eq(stockLengths.id, m.stockLengthId), sql`${stockLengths.onHand} + ${m.quantityDelta} >= 0`))
      .returning({ onHand: stockLengths.onHand });
    if (updated.length === 0) {
      throw new AppError(
        'conflict',
        `Only ${length.onHand} of the ${length.lengthMm} mm length are on hand; on-hand stock cannot go below zero.`,
      );
    }
  }
  const [movement] = await tx
    .insert(stockMovements)
    .values({
      at: m.at ?? new Date(),
      kind: m.kind,
      userId: m.userId,
      sectionId: length.sectionId,
      stockLengthId: length.id,
      quantityDelta: m.quantityDelta,
      lengthMm: length.lengthMm,
      valuePence: Math.abs(m.quantityDelta) * length.pricePence,
      planId: m.planId ?? null,
      jobId: m.jobId ?? null,
      reason: m.reason,
    })
    .returning();
  return movement;
}
