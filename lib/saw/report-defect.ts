import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, planBoards, stockLengths, stockMovements } from '@/db/schema';
import { AppError } from '@/lib/errors';
import type { PlanSettings } from '@/lib/plans/plan-shapes';
import type { ReportDefectBody } from '@/lib/validations/saw';
import { assertAtSaw, loadBoardForSaw } from './load-board';
import { makeOffcut } from './make-offcut';
import { recordStockCut } from './record-stock-cut';
import { replanBoardPieces } from './replan-board-pieces';
import { planProgress, settlePlanStatus } from './settle-plan-status';

/**
 * Records a bad board and re-plans its pieces at once. The board is consumed (a stock board is cut
 * from stock, a rack offcut is scrapped); a sound part at least the yard's minimum offcut goes on
 * the rack, where the re-plan may use it. Reporting the same board again changes nothing.
 */
export async function reportDefect({
  planId,
  boardNo,
  userId,
  reason,
  note,
  usableMm,
}: ReportDefectBody & { planId: number; boardNo: number; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const { plan, job, board } = await loadBoardForSaw(tx, { planId, boardNo });
    if (board.status === 'defective') {
      return {
        boardNo,
        alreadyReported: true,
        newOffcut: null,
        replan: null,
        ...(await planProgress(tx, planId)),
      };
    }
    if (board.status === 'done')
      throw new AppError('conflict', `Board ${boardNo} is already confirmed cut. Undo it first.`);
    assertAtSaw(plan, job);
    if (usableMm !== undefined && usableMm >= board.lengthMm) {
      throw new AppError(
        'invalid',
        `The usable part must be shorter than the board (${board.lengthMm} mm).`,
        {
          issues: [{ path: 'usableMm', message: `Must be less than ${board.lengthMm} mm.` }],
        },
      );
    }
    const settings = plan.settings as PlanSettings;
    const at = new Date();
    const where = `board ${boardNo} of job ${job.reference}`;
    const why = `${reason[0].toUpperCase()}${reason.slice(1)}${note ? ` (${note})` : ''}`;
    const [stock] = board.stockLengthId
      ? await tx.select().from(stockLengths).where(eq(stockLengths.id, board.stockLengthId))
      : [];
    await tx.insert(stockMovements).values({
      at,
      kind: 'defect',
      userId,
      sectionId: board.sectionId,
      stockLengthId: board.stockLengthId,
      offcutId: board.offcutId,
      lengthMm: board.lengthMm,
      valuePence: stock?.pricePence ?? 0,
      planId,
      jobId: job.id,
      reason: `${why}: ${where}`,
    });
    if (board.source === 'stock' && board.stockLengthId) {
      await recordStockCut(tx, {
        stockLengthId: board.stockLengthId,
        sectionId: board.sectionId,
        planId,
        jobId: job.id,
        userId,
        at,
        reason: `Bad board (${reason}) for ${where}`,
      });
    }
    if (board.source === 'offcut' && board.offcutId) {
      const [bad] = await tx
        .update(offcuts)
        .set({ status: 'scrapped', reservedByPlanId: null, scrapReason: `Defect: ${why}`, updatedAt: at })
        .where(eq(offcuts.id, board.offcutId))
        .returning();
      await tx.insert(stockMovements).values({
        at,
        kind: 'offcut_scrapped',
        userId,
        sectionId: bad.sectionId,
        offcutId: bad.id,
        lengthMm: bad.lengthMm,
        planId,
        jobId: job.id,
        reason: `Defect (${why}) on ${where}`,
      });
    }
    const sound =
      usableMm !== undefined && usableMm >= settings.minOffcutMm
        ? await makeOffcut(tx, {
            sectionId: board.sectionId,
            lengthMm: usableMm,
            origin: `Sound part of bad ${where}`,
            planId,
            jobId: job.id,
            userId,
            at,
          })
        : null;
    await tx
      .update(planBoards)
      .set({
        status: 'defective',
        defectReason: why,
        doneAt: at,
        doneBy: userId,
        newOffcutId: sound?.id ?? null,
      })
      .where(eq(planBoards.id, board.id));

    const replan = await replanBoardPieces(tx, { planId, settings, job, board, userId, at });
    const progress = await settlePlanStatus(tx, { planId, jobId: job.id });
    return {
      boardNo,
      alreadyReported: false,
      newOffcut: sound ? { id: sound.id, tag: sound.tag } : null,
      replan,
      ...progress,
    };
  });
}
