// Writes a bad board: its defect movement, the stock or rack offcut it consumed, and its sound part.
import { eq } from 'drizzle-orm';
import type { Tx } from '@/db';
import { offcuts, planBoards, stockLengths, stockMovements, type Job, type PlanBoard } from '@/db/schema';
import { makeOffcut } from './make-offcut';
import { recordStockCut } from './record-stock-cut';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

export async function recordDefect(
  tx: Tx,
  {
    planId,
    job,
    board,
    userId,
    reason,
    note,
    soundMm,
    at,
  }: {
    planId: number;
    job: Job;
    board: PlanBoard;
    userId: number;
    reason: string;
    note?: string;
    soundMm: number | null;
    at: Date;
  },
) {
  const where = `board ${board.boardNo} of job ${job.reference}`;
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
      // The operator is holding the bad board: it is there, whatever the count says (the owner is
      // still flagged to recount when the count showed none).
      boardThere: true,
    });
  }
  if (board.source === 'offcut' && board.offcutId) {
    const [bad] = await tx
      .update(offcuts)
      .set({ status: 'scrapped', reservedByPlanId: null, scrapReason: `Defect: ${why}`, updatedAt: at })
      .where(eq(offcuts.id, board.offcutId))
      .returning();
    await recordOffcutMovement(tx, {
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
    soundMm !== null
      ? await makeOffcut(tx, {
          sectionId: board.sectionId,
          lengthMm: soundMm,
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
  return sound;
}
