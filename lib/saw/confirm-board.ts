import 'server-only';
import { and, eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, planBoards } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { assertAtSaw, loadBoardForSaw } from './load-board';
import { makeOffcut } from './make-offcut';
import { recordStockCut } from './record-stock-cut';
import { planProgress, settlePlanStatus } from './settle-plan-status';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

/**
 * Confirms a board cut: its pieces count as cut, a consumed offcut leaves the rack, a kept remainder
 * becomes a new tagged offcut — all in one transaction. Confirming a board already done changes
 * nothing and answers the same.
 */
export async function confirmBoard({
  planId,
  boardNo,
  userId,
  location,
  boardThere,
}: {
  planId: number;
  boardNo: number;
  userId: number;
  location?: string;
  boardThere?: boolean;
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const { plan, job, board } = await loadBoardForSaw(tx, { planId, boardNo });
    if (board.status === 'done') {
      const progress = await planProgress(tx, planId);
      const [made] = board.newOffcutId
        ? await tx.select().from(offcuts).where(eq(offcuts.id, board.newOffcutId))
        : [];
      return {
        boardNo,
        alreadyDone: true,
        newOffcut: made ? { id: made.id, tag: made.tag } : null,
        ...progress,
      };
    }
    if (board.status === 'defective')
      throw new AppError('conflict', `Board ${boardNo} was reported defective; it cannot be confirmed.`);
    assertAtSaw(plan, job);

    const at = new Date();
    const where = `job ${job.reference}, board ${boardNo}`;
    if (board.source === 'stock' && board.stockLengthId) {
      await recordStockCut(tx, {
        stockLengthId: board.stockLengthId,
        sectionId: board.sectionId,
        planId,
        jobId: job.id,
        userId,
        at,
        reason: `Cut for ${where}`,
        boardThere,
      });
    }
    if (board.source === 'offcut' && board.offcutId) {
      const [used] = await tx
        .update(offcuts)
        .set({ status: 'used', reservedByPlanId: null, updatedAt: at })
        .where(and(eq(offcuts.id, board.offcutId), eq(offcuts.reservedByPlanId, planId)))
        .returning();
      if (!used)
        throw new AppError(
          'conflict',
          `The offcut for board ${boardNo} is no longer reserved for this plan.`,
        );
      await recordOffcutMovement(tx, {
        at,
        kind: 'offcut_used',
        userId,
        sectionId: used.sectionId,
        offcutId: used.id,
        lengthMm: used.lengthMm,
        planId,
        jobId: job.id,
        reason: `Used for ${where}`,
      });
    }
    const made =
      board.keepRemainder && board.remainderMm > 0
        ? await makeOffcut(tx, {
            sectionId: board.sectionId,
            lengthMm: board.remainderMm,
            location,
            origin: `Kept remainder of ${where}`,
            planId,
            jobId: job.id,
            userId,
            at,
          })
        : null;
    await tx
      .update(planBoards)
      .set({ status: 'done', doneAt: at, doneBy: userId, newOffcutId: made?.id ?? null })
      .where(eq(planBoards.id, board.id));
    const progress = await settlePlanStatus(tx, { planId, jobId: job.id });
    return {
      boardNo,
      alreadyDone: false,
      newOffcut: made ? { id: made.id, tag: made.tag } : null,
      ...progress,
    };
  });
}
