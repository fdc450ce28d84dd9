// Re-plans the pieces of a bad board at once, from the stock and the rack offcuts still free.
import { and, asc, eq, inArray, max } from 'drizzle-orm';
import type { Tx } from '@/db';
import {
  jobs,
  offcuts,
  planBoards,
  sections,
  stockLengths,
  stockMovements,
  type Job,
  type PlanBoard,
} from '@/db/schema';
import { buildSolverInput, type PlanningItem } from '@/lib/plans/build-solver-input';
import { parseSourceId, type BoardPiece, type PlanSettings } from '@/lib/plans/plan-shapes';
import { runSolver } from '@/lib/plans/run-solver';
import { planBoardRows } from '@/lib/plans/summarise-plan';

/** A re-plan is a handful of pieces; the operator is waiting at the saw. */
const REPLAN_TIME_LIMIT_MS = 1_000;

export async function replanBoardPieces(
  tx: Tx,
  {
    planId,
    settings,
    job,
    board,
    userId,
    at,
  }: { planId: number; settings: PlanSettings; job: Job; board: PlanBoard; userId: number; at: Date },
) {
  const pieces = board.pieces as BoardPiece[];
  const items = new Map<number, PlanningItem & { label: string }>();
  for (const p of pieces) {
    const item = items.get(p.jobItemId) ?? {
      id: p.jobItemId,
      lengthMm: p.lengthMm,
      quantity: 0,
      label: p.label,
    };
    item.quantity += 1;
    items.set(p.jobItemId, item);
  }
  const [section] = await tx.select().from(sections).where(eq(sections.id, board.sectionId));
  const stock = await tx.select().from(stockLengths).where(eq(stockLengths.sectionId, board.sectionId));
  // Only 'available' offcuts: a reserved one belongs to another plan.
  const rack = await tx
    .select({ id: offcuts.id, lengthMm: offcuts.lengthMm })
    .from(offcuts)
    .where(and(eq(offcuts.sectionId, board.sectionId), eq(offcuts.status, 'available')))
    .orderBy(asc(offcuts.id));
  const input = buildSolverInput({
    items: [...items.values()],
    stock,
    offcuts: rack,
    settings: { ...settings, timeLimitMs: Math.min(settings.timeLimitMs, REPLAN_TIME_LIMIT_MS) },
  });
  const output = await runSolver(input);

  const labels = new Map([...items.values()].map((i) => [i.id, i.label]));
  const [{ top }] = await tx
    .select({ top: max(planBoards.boardNo) })
    .from(planBoards)
    .where(eq(planBoards.planId, planId));
  const rows = planBoardRows(
    [{ sectionId: board.sectionId, sectionName: section.name, input, output }],
    labels,
  ).map((r, i) => ({
    ...r,
    planId,
    boardNo: (top ?? 0) + i + 1,
  }));
  if (rows.length) await tx.insert(planBoards).values(rows);

  const offcutIds = output.boards
    .filter((b) => b.source === 'offcut')
    .map((b) => parseSourceId(b.sourceId).id);
  if (offcutIds.length) {
    const reserved = await tx
      .update(offcuts)
      .set({ status: 'reserved', reservedByPlanId: planId, updatedAt: at })
      .where(and(inArray(offcuts.id, offcutIds), eq(offcuts.status, 'available')))
      .returning();
    await tx.insert(stockMovements).values(
      reserved.map((o) => ({
        at,
        kind: 'offcut_reserved' as const,
        userId,
        sectionId: o.sectionId,
        offcutId: o.id,
        lengthMm: o.lengthMm,
        planId,
        jobId: job.id,
        reason: `Reserved for job ${job.reference} after a defect on board ${board.boardNo}`,
      })),
    );
  }

  const unplaced = output.unplaced.map((u) => ({ ...u, label: labels.get(Number(u.id.slice(1))) ?? '' }));
  if (unplaced.length) {
    const list = unplaced.map((u) => `${u.label || 'piece'} ${u.length} mm`).join(', ');
    const message = `Board ${board.boardNo} (${section.name}) was bad and ${unplaced.length} piece${unplaced.length > 1 ? 's' : ''} could not be re-planned from stock or the rack: ${list}.`;
    await tx
      .update(jobs)
      .set({ officeFlag: job.officeFlag ? `${job.officeFlag} ${message}` : message, updatedAt: at })
      .where(eq(jobs.id, job.id));
  }
  return { input, output, boardNos: rows.map((r) => r.boardNo), unplaced };
}
