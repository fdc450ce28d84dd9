import 'server-only';
import { and, desc, eq, inArray, ne, sql } from 'drizzle-orm';
import { getDb, type Tx } from '@/db';
import { jobs, offcuts, planBoards, plans, stockLengths, stockMovements } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { loadPlanForSaw } from './load-board';
import { settlePlanStatus } from './settle-plan-status';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

/**
 * Takes back the plan's latest board confirmation while the plan is being cut. History is never
 * rewritten: new 'board_undone' movements reverse what the confirmation did (the stock board goes
 * back on hand, a consumed offcut is reserved for this plan again, the kept remainder leaves the
 * rack), and the board is pending again. Refused with 409 on a finished or uncut plan, and when
 * the new offcut is already used, reserved or planned elsewhere.
 */
export async function undoLastBoard({ planId, userId }: { planId: number; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const { plan, job } = await loadPlanForSaw(tx, planId);
    if (plan.status !== 'released' || job.status !== 'cutting') {
      throw new AppError(
        'conflict',
        plan.status === 'done'
          ? 'This plan is finished; a finished plan cannot be undone. Record a stocktake instead.'
          : `Undo works only while a plan is being cut; this plan is ${plan.status} and job ${job.reference} is ${job.status}.`,
      );
    }
    const [board] = await tx
      .select()
      .from(planBoards)
      .where(and(eq(planBoards.planId, planId), eq(planBoards.status, 'done')))
      .orderBy(desc(planBoards.doneAt), desc(planBoards.boardNo))
      .limit(1);
    if (!board) throw new AppError('conflict', 'No board of this plan has been confirmed yet.');

    const at = new Date();
    const base = {
      at,
      kind: 'board_undone' as const,
      userId,
      planId,
      jobId: job.id,
      sectionId: board.sectionId,
    };
    const reason = `Board ${board.boardNo} of job ${job.reference} taken back`;
    if (board.newOffcutId) await withdrawNewOffcut(tx, board, planId, { ...base, reason });
    if (board.source === 'stock' && board.stockLengthId) {
      const [stock] = await tx.select().from(stockLengths).where(eq(stockLengths.id, board.stockLengthId));
      await tx.insert(stockMovements).values({
        ...base,
        stockLengthId: stock.id,
        quantityDelta: 1,
        lengthMm: stock.lengthMm,
        valuePence: -stock.pricePence,
        reason: `${reason}: the board goes back in stock`,
      });
      await tx
        .update(stockLengths)
        .set({ onHand: sql`${stockLengths.onHand} + 1` })
        .where(and(eq(stockLengths.id, stock.id), sql`${stockLengths.onHand} is not null`));
    }
    if (board.source === 'offcut' && board.offcutId) {
      const [used] = await tx
        .update(offcuts)
        .set({ status: 'reserved', reservedByPlanId: planId, updatedAt: at })
        .where(and(eq(offcuts.id, board.offcutId), eq(offcuts.status, 'used')))
        .returning();
      if (used) {
        await recordOffcutMovement(tx, {
          ...base,
          offcutId: used.id,
          lengthMm: used.lengthMm,
          reason: `${reason}: offcut ${used.tag} is reserved for it again`,
        });
      }
    }
    await tx
      .update(planBoards)
      .set({ status: 'pending', doneAt: null, doneBy: null, newOffcutId: null })
      .where(eq(planBoards.id, board.id));
    const progress = await settlePlanStatus(tx, { planId, jobId: job.id });
    return { boardNo: board.boardNo, ...progress };
  });
}

/** The board's kept remainder leaves the rack, unless someone already counts on it. */
async function withdrawNewOffcut(
  tx: Tx,
  board: { boardNo: number; newOffcutId: number | null },
  planId: number,
  movement: Omit<typeof stockMovements.$inferInsert, 'lengthMm'>,
) {
  const [made] = await tx.select().from(offcuts).where(eq(offcuts.id, board.newOffcutId!));
  if (!made) return;
  if (made.status !== 'available') {
    throw new AppError(
      'conflict',
      `Offcut ${made.tag} from board ${board.boardNo} is already ${made.status}; the board cannot be taken back.`,
    );
  }
  const [plannedElsewhere] = await tx
    .select({ reference: jobs.reference })
    .from(planBoards)
    .innerJoin(plans, eq(plans.id, planBoards.planId))
    .innerJoin(jobs, eq(jobs.id, plans.jobId))
    .where(
      and(
        eq(planBoards.offcutId, made.id),
        ne(planBoards.planId, planId),
        inArray(plans.status, ['planned', 'released']),
      ),
    )
    .limit(1);
  if (plannedElsewhere) {
    throw new AppError(
      'conflict',
      `Offcut ${made.tag} from board ${board.boardNo} is already in a plan for job ${plannedElsewhere.reference}; the board cannot be taken back.`,
    );
  }
  await tx
    .update(offcuts)
    .set({ status: 'scrapped', reservedByPlanId: null, updatedAt: movement.at ?? new Date() })
    .where(eq(offcuts.id, made.id));
  await recordOffcutMovement(tx, {
    ...movement,
    offcutId: made.id,
    lengthMm: made.lengthMm,
    reason: `${movement.reason}: offcut ${made.tag} leaves the rack`,
  });
}
