// `npm run worker`: a solver worker for server mode. Start as many as you like, on any machine that
// reaches the database (DATABASE_URL). Each takes one planning run at a time from the queue.
import { getDb } from '../db';
import { databaseUrl } from '../lib/env';
import {
  getPlanQueue,
  PLAN_RUN_DEAD_QUEUE,
  PLAN_RUN_QUEUE,
  PLAN_RUN_RETRY_LIMIT,
  type PlanRunMessage,
} from '../lib/plans/queue/plan-queue';
import { failPlanRun } from '../lib/plans/queue/plan-runs';
import { processPlanRun } from '../lib/plans/queue/process-plan-run';

const url = databaseUrl();
if (!url) {
  console.error('Kerfwise worker: set DATABASE_URL. Embedded mode solves inside the app process.');
  process.exit(1);
}

const db = await getDb(); // migrates under the advisory lock, like the app instances
const boss = await getPlanQueue(url, 'worker');

await boss.work<PlanRunMessage>(
  PLAN_RUN_QUEUE,
  { batchSize: 1, pollingIntervalSeconds: 1 },
  async ([job]) => {
    const outcome = await processPlanRun(db, job.data.runId);
    console.log(`Kerfwise worker ${process.pid}: run ${job.data.runId} ${outcome}`);
  },
);

// Runs that failed every try land here; the run record says so in words the yard hand can act on.
await boss.work<PlanRunMessage>(PLAN_RUN_DEAD_QUEUE, { pollingIntervalSeconds: 2 }, async ([job]) => {
  await failPlanRun(
    db,
    job.data.runId,
    `The cutting engine failed ${PLAN_RUN_RETRY_LIMIT + 1} times on this job. Plan it again, or with fewer pieces; ` +
      'if it keeps failing, tell whoever runs the Kerfwise server.',
  );
});

console.log(`Kerfwise worker ${process.pid} is waiting for planning runs.`);

async function shutDown() {
  await boss.stop({ graceful: true, timeout: 10_000 });
  process.exit(0);
}
process.once('SIGTERM', () => void shutDown());
process.once('SIGINT', () => void shutDown());
