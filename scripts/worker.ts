// `npm run worker`: a solver worker for server mode. Start as many as you like, on any machine that
// reaches the database (DATABASE_URL). Each takes one planning run at a time from the queue.
import { getDb } from '../db';
import { setDatabasePreparation } from '../db/server-db';
import { databaseUrl } from '../db/env';
import { prepareYard } from '../lib/server/prepare-yard';
import { getPlanQueue } from '../lib/plans/queue/plan-queue';
import { startPlanWorker } from '../lib/plans/queue/plan-worker';

const url = databaseUrl();
if (!url) {
  console.error('Kerfwise worker: set DATABASE_URL. Embedded mode solves inside the app process.');
  process.exit(1);
}

setDatabasePreparation(prepareYard); // a worker may be first on an empty database, like an instance
const db = await getDb(); // migrates under the advisory lock, like the app instances
const boss = await getPlanQueue(url, 'worker');

await startPlanWorker(db, boss);

console.log(`Kerfwise worker ${process.pid} is waiting for planning runs.`);

async function shutDown() {
  await boss.stop({ graceful: true, timeout: 10_000 });
  process.exit(0);
}
process.once('SIGTERM', () => void shutDown());
process.once('SIGINT', () => void shutDown());
