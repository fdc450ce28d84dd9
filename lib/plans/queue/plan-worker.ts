// The solver worker's two jobs on the queue: solve planning runs, and mark the runs that failed every
// try. `npm run worker` starts it; tests start it in-process with a run processor of their own.
import type PgBoss from 'pg-boss';
import type { Db } from '@/db';
import { PLAN_RUN_DEAD_QUEUE, PLAN_RUN_QUEUE, PLAN_RUN_RETRY_LIMIT, type PlanRunMessage } from './plan-queue';
import { failPlanRun } from './plan-runs';
import { processPlanRun } from './process-plan-run';

export const DEAD_RUN_MESSAGE =
  `The cutting engine failed ${PLAN_RUN_RETRY_LIMIT + 1} times on this job. Plan it again, or with fewer ` +
  'pieces; if it keeps failing, tell whoever runs the Kerfwise server.';

type ProcessRun = (db: Db, runId: number) => Promise<string>;

export async function startPlanWorker(
  db: Db,
  boss: PgBoss,
  { processRun = processPlanRun as ProcessRun, log = console.log } = {},
): Promise<void> {
  await boss.work<PlanRunMessage>(
    PLAN_RUN_QUEUE,
    { batchSize: 1, pollingIntervalSeconds: 1 },
    async ([job]) => {
      const outcome = await processRun(db, job.data.runId);
      log(`Kerfwise worker ${process.pid}: run ${job.data.runId} ${outcome}`);
    },
  );
  // Runs that failed every try land here; the run record says so in words the yard hand can act on.
  await boss.work<PlanRunMessage>(PLAN_RUN_DEAD_QUEUE, { pollingIntervalSeconds: 1 }, async ([job]) => {
    await failPlanRun(db, job.data.runId, DEAD_RUN_MESSAGE);
  });
}
