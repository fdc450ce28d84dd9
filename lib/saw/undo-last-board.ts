import 'server-only';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, planBoards, stockLengths, stockMovements } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { loadPlanForSaw } from './load-board';
import { settlePlanStatus } from './settle-plan-status';

const CONFIRMATION_KINDS = ['stock_cut', 'stocktake', 'offcut_used', 'offcut_made'] as const;

/**
 * Takes back the plan's most recent board confirmation: deletes exactly the movement rows it wrote
 * (they share the board's doneAt), restores on-hand stock and the consumed offcut, removes the new
 * offcut, and puts the board back to pending. Refused once the new offcut has been reserved or used.
 */
export async function undoLastBoard({ planId }: { planId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const { plan, job } = await loadPlanForSaw(tx, planId);
    if (plan.status !== 'released' && plan.status !== 'done')
      throw new AppError('conflict', `This plan is ${plan.status}, not at the saw.`);
    const [board] = await tx
      .select()
      .from(planBoards)
      .where(and(eq(planBoards.planId, planId), eq(planBoards.status, 'done')))
      .orderBy(desc(planBoards.doneAt), desc(planBoards.boardNo))
      .limit(1);
    if (!board || !board.doneAt)
      throw new AppError('conflict', 'No board of this plan has been confirmed yet.');

    if (board.newOffcutId) {
      const [made] = await tx.select().from(offcuts).where(eq(offcuts.id, board.newOffcutId));
      if (made && made.status !== 'available') {
        throw new AppError(
          'conflict',
          `Offcut ${made.tag} from board ${board.boardNo} is already ${made.status}; it cannot be taken back.`,
        );
      }
    }
    const rows = await tx
      .delete(stockMovements)
      .where(
        and(
          eq(stockMovements.planId, planId),
          eq(stockMovements.at, board.doneAt),
          inArray(stockMovements.kind, [...CONFIRMATION_KINDS]),
        ),
      )
      .returning();
    // Give back to on hand exactly what the deleted rows took (a "counted short" pair nets to 0).
    const delta = rows
      .filter((r) => r.stockLengthId === board.stockLengthId)
      .reduce((n, r) => n + r.quantityDelta, 0);
    if (board.stockLengthId && delta !== 0) {
      await tx
        .update(stockLengths)
        .set({ onHand: sql`${stockLengths.onHand} - ${delta}` })
        .where(and(eq(stockLengths.id, board.stockLengthId), sql`${stockLengths.onHand} is not null`));
    }
    await tx
      .update(planBoards)
      .set({ status: 'pending', doneAt: null, doneBy: null, newOffcutId: null })
      .where(eq(planBoards.id, board.id));
    if (board.newOffcutId) {
      // A relabelled location (offcut_moved) is about the same piece: it goes with it.
      await tx.delete(stockMovements).where(eq(stockMovements.offcutId, board.newOffcutId));
      await tx.delete(offcuts).where(eq(offcuts.id, board.newOffcutId));
    }
    if (board.offcutId) {
      await tx
        .update(offcuts)
        .set({ status: 'reserved', reservedByPlanId: planId, updatedAt: new Date() })
        .where(eq(offcuts.id, board.offcutId));
    }
    const progress = await settlePlanStatus(tx, { planId, jobId: job.id });
    return { boardNo: board.boardNo, ...progress };
  });
}
