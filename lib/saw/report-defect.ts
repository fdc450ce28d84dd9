import 'server-only';
import { getDb } from '@/db';
import type { PlanBoard } from '@/db/schema';
import { AppError } from '@/lib/errors';
import type { PlanSettings } from '@/lib/plans/plan-shapes';
import { runSolver } from '@/lib/plans/run-solver';
import type { ReportDefectBody } from '@/lib/validations/saw';
import { assertAtSaw, loadBoardForSaw } from './load-board';
import { recordDefect } from './record-defect';
import { prepareReplan, replanStillFits, writeReplan } from './replan-board-pieces';
import { planProgress, settlePlanStatus } from './settle-plan-status';

/** Another plan may take a chosen rack offcut while the re-plan solves; then solve again. */
const MAX_SOLVES = 3;

function assertCanReport(
  plan: { status: string },
  job: { reference: string; status: string },
  board: PlanBoard,
  usableMm: number | undefined,
) {
  if (board.status === 'done')
    throw new AppError('conflict', `Board ${board.boardNo} is already confirmed cut. Undo it first.`);
  assertAtSaw(plan, job);
  if (usableMm !== undefined && usableMm >= board.lengthMm) {
    throw new AppError('invalid', `The usable part must be shorter than the board (${board.lengthMm} mm).`, {
      issues: [{ path: 'usableMm', message: `Must be less than ${board.lengthMm} mm.` }],
    });
  }
}

/**
 * Records a bad board and re-plans its pieces at once. The board is consumed (a stock board is cut
 * from stock, a rack offcut is scrapped); a sound part at least the yard's minimum offcut goes on
 * the rack, where the re-plan may use it. Reporting the same board again changes nothing.
 * The solve runs with no transaction open (it can take a second and the database has one
 * connection); the write then re-checks the board and the rack inside its own transaction.
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
  const alreadyReported = () =>
    db.transaction(async (tx) => ({
      boardNo,
      alreadyReported: true,
      newOffcut: null,
      replan: null,
      ...(await planProgress(tx, planId)),
    }));

  for (let solves = 0; solves < MAX_SOLVES; solves++) {
    const { plan, job, board } = await db.transaction((tx) => loadBoardForSaw(tx, { planId, boardNo }));
    if (board.status === 'defective') return alreadyReported();
    assertCanReport(plan, job, board, usableMm);
    const settings = plan.settings as PlanSettings;
    const soundMm = usableMm !== undefined && usableMm >= settings.minOffcutMm ? usableMm : null;
    const draft = await prepareReplan(db, { settings, board, soundMm });
    const solved = await runSolver(draft.input);

    const written = await db.transaction(async (tx) => {
      const now = await loadBoardForSaw(tx, { planId, boardNo });
      if (now.board.status === 'defective') return 'reported meanwhile' as const;
      assertCanReport(now.plan, now.job, now.board, usableMm);
      if (!(await replanStillFits(tx, solved))) return 'rack changed' as const;
      const at = new Date();
      const sound = await recordDefect(tx, {
        planId,
        job: now.job,
        board: now.board,
        userId,
        reason,
        note,
        soundMm,
        at,
      });
      const replan = await writeReplan(tx, {
        planId,
        job: now.job,
        board: now.board,
        userId,
        at,
        draft,
        solved,
        soundOffcutId: sound?.id ?? null,
      });
      const progress = await settlePlanStatus(tx, { planId, jobId: now.job.id });
      return {
        boardNo,
        alreadyReported: false,
        newOffcut: sound ? { id: sound.id, tag: sound.tag } : null,
        replan,
        ...progress,
      };
    });
    if (written === 'reported meanwhile') return alreadyReported();
    if (written !== 'rack changed') return written;
  }
  throw new AppError(
    'conflict',
    `The rack kept changing while board ${boardNo} was re-planned. Report it again.`,
  );
}
