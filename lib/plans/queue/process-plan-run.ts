// What a solver worker does with one queued run. Safe to run again after a crash: the plan and the
// run's "done" are stored in one transaction, and a run that already has its plan is skipped.
import 'server-only';
import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '@/db';
import { planRuns } from '@/db/schema';
import { AppError } from '@/lib/errors';
import type { CreatePlanBody } from '@/lib/validations/plans';
import { composePlan } from '../compose-plan';
import { preparePlanning } from '../create-plan';
import { insertPlanInTx } from '../insert-plan';
import { runSolver } from '../run-solver';
import { countSolvedSection, failPlanRun } from './plan-runs';

export async function processPlanRun(db: Db, runId: number): Promise<'done' | 'skipped' | 'failed'> {
  const [run] = await db
    .update(planRuns)
    .set({
      status: 'running',
      attempts: sql`${planRuns.attempts} + 1`,
      sectionsDone: 0,
      updatedAt: new Date(),
    })
    .where(and(eq(planRuns.id, runId), inArray(planRuns.status, ['queued', 'running'])))
    .returning();
  if (!run) return 'skipped'; // cancelled, already done, or given up on
  try {
    const overrides = run.overrides as CreatePlanBody;
    const { data, settings, perCutChargePence } = await preparePlanning(db, { jobId: run.jobId, overrides });
    const plan = await composePlan({
      data,
      settings,
      perCutChargePence,
      solve: async (input) => {
        const output = await runSolver(input);
        await countSolvedSection(db, runId);
        return output;
      },
    });
    return await db.transaction(async (tx) => {
      const [current] = await tx.select().from(planRuns).where(eq(planRuns.id, runId)).for('update');
      if (current.status !== 'running' || current.planId !== null) return 'skipped' as const;
      const planId = await insertPlanInTx(tx, { jobId: run.jobId, settings, plan, userId: run.createdBy });
      await tx
        .update(planRuns)
        .set({ status: 'done', planId, error: null, updatedAt: new Date() })
        .where(eq(planRuns.id, runId));
      return 'done' as const;
    });
  } catch (error) {
    // A planning conflict (job released meanwhile, no items) will not change on a retry.
    if (error instanceof AppError) {
      await failPlanRun(db, runId, error.message);
      return 'failed';
    }
    throw error; // the queue retries it with backoff
  }
}
