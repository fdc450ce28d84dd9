// Re-plans the pieces of a bad board from the stock and the rack offcuts still free. The solve runs
// between two steps: prepareReplan reads (no transaction), writeReplan re-checks and writes inside one.
import { and, asc, eq, inArray, max } from 'drizzle-orm';
import type { DbOrTx, Tx } from '@/db';
import { jobs, offcuts, planBoards, sections, stockLengths, type Job, type PlanBoard } from '@/db/schema';
import { buildSolverInput, type PlanningItem } from '@/lib/plans/build-solver-input';
import { offcutSourceId, parseSourceId, type BoardPiece, type PlanSettings } from '@/lib/plans/plan-shapes';
import { planBoardRows } from '@/lib/plans/summarise-plan';
import type { SolveInput, SolvePlan } from '@/solver';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

/** A re-plan is a handful of pieces; the operator is waiting at the saw. */
const REPLAN_TIME_LIMIT_MS = 1_000;
/** Stands in for the bad board's sound part, which only gets its rack id when the defect is written. */
const SOUND_PART_ID = 0;

export type ReplanDraft = { input: SolveInput; labels: Map<number, string>; sectionName: string };

/** Builds the solver input for the bad board's pieces; the sound part (if any) may be used at once. */
export async function prepareReplan(
  db: DbOrTx,
  { settings, board, soundMm }: { settings: PlanSettings; board: PlanBoard; soundMm: number | null },
): Promise<ReplanDraft> {
  const items = new Map<number, PlanningItem & { label: string }>();
  for (const p of board.pieces as BoardPiece[]) {
    const item = items.get(p.jobItemId) ?? {
      id: p.jobItemId,
      lengthMm: p.lengthMm,
      quantity: 0,
      toleranceMm: p.toleranceMm ?? 0,
      label: p.label,
    };
    item.quantity += 1;
    items.set(p.jobItemId, item);
  }
  const [section] = await db.select().from(sections).where(eq(sections.id, board.sectionId));
  const stock = await db.select().from(stockLengths).where(eq(stockLengths.sectionId, board.sectionId));
  // Only 'available' offcuts: a reserved one belongs to another plan.
  const rack = await db
    .select({ id: offcuts.id, lengthMm: offcuts.lengthMm })
    .from(offcuts)
    .where(and(eq(offcuts.sectionId, board.sectionId), eq(offcuts.status, 'available')))
    .orderBy(asc(offcuts.id));
  if (soundMm !== null) rack.push({ id: SOUND_PART_ID, lengthMm: soundMm });
  const input = buildSolverInput({
    items: [...items.values()],
    stock,
    offcuts: rack,
    settings: { ...settings, timeLimitMs: Math.min(settings.timeLimitMs, REPLAN_TIME_LIMIT_MS) },
  });
  const labels = new Map([...items.values()].map((i) => [i.id, i.label]));
  return { input, labels, sectionName: section.name };
}

/** The rack offcuts the solve chose, other than the sound part. */
function chosenRackOffcuts(output: SolvePlan): number[] {
  return output.boards
    .filter((b) => b.source === 'offcut')
    .map((b) => parseSourceId(b.sourceId).id)
    .filter((id) => id !== SOUND_PART_ID);
}

/** True when every rack offcut the solve chose is still free, so its result can be written. */
export async function replanStillFits(tx: Tx, output: SolvePlan): Promise<boolean> {
  const ids = chosenRackOffcuts(output);
  if (!ids.length) return true;
  const free = await tx
    .select({ id: offcuts.id })
    .from(offcuts)
    .where(and(inArray(offcuts.id, ids), eq(offcuts.status, 'available')));
  return free.length === new Set(ids).size;
}

/** Gives the sound part its real rack id in the stored input and output. */
function withSoundPartId(draft: ReplanDraft, output: SolvePlan, soundOffcutId: number | null) {
  const placeholder = offcutSourceId(SOUND_PART_ID);
  const real = soundOffcutId === null ? placeholder : offcutSourceId(soundOffcutId);
  const rename = (id: string) => (id === placeholder ? real : id);
  return {
    input: { ...draft.input, offcuts: draft.input.offcuts.map((o) => ({ ...o, id: rename(o.id) })) },
    output: { ...output, boards: output.boards.map((b) => ({ ...b, sourceId: rename(b.sourceId) })) },
  };
}

/** Writes the re-plan's boards and reservations; call only after replanStillFits in the same transaction. */
export async function writeReplan(
  tx: Tx,
  {
    planId,
    job,
    board,
    userId,
    at,
    draft,
    solved,
    soundOffcutId,
  }: {
    planId: number;
    job: Job;
    board: PlanBoard;
    userId: number;
    at: Date;
    draft: ReplanDraft;
    solved: SolvePlan;
    soundOffcutId: number | null;
  },
) {
  const { input, output } = withSoundPartId(draft, solved, soundOffcutId);
  const { labels, sectionName } = draft;
  const [{ top }] = await tx
    .select({ top: max(planBoards.boardNo) })
    .from(planBoards)
    .where(eq(planBoards.planId, planId));
  const rows = planBoardRows([{ sectionId: board.sectionId, sectionName, input, output }], labels).map(
    (r, i) => ({ ...r, planId, boardNo: (top ?? 0) + i + 1 }),
  );
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
    await recordOffcutMovement(
      tx,
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
    const message = `Board ${board.boardNo} (${sectionName}) was bad and ${unplaced.length} piece${unplaced.length > 1 ? 's' : ''} could not be re-planned from stock or the rack: ${list}.`;
    await tx
      .update(jobs)
      .set({ officeFlag: job.officeFlag ? `${job.officeFlag} ${message}` : message, updatedAt: at })
      .where(eq(jobs.id, job.id));
  }
  return { input, output, boardNos: rows.map((r) => r.boardNo), unplaced };
}
