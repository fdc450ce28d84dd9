// The solver queue of server mode: pg-boss on the same PostgreSQL database. App instances only send;
// `npm run worker` processes. A run whose worker dies stays active until it expires, then pg-boss
// retries it with backoff; after the last try it moves to the dead-letter queue.
import PgBoss from 'pg-boss';
import { getEnv } from '@/lib/env';

export const PLAN_RUN_QUEUE = 'plan-run';
export const PLAN_RUN_DEAD_QUEUE = 'plan-run-dead';
export const PLAN_RUN_RETRY_LIMIT = 3;

export type PlanRunMessage = { runId: number };

type Cache = { kerfwiseBoss?: Promise<PgBoss> };
const cache = globalThis as unknown as Cache;

async function startBoss(url: string, role: 'sender' | 'worker'): Promise<PgBoss> {
  const env = getEnv();
  const boss = new PgBoss({
    connectionString: url,
    max: role === 'worker' ? 4 : 2,
    // Only workers look after expired runs and queue housekeeping; app instances only send.
    supervise: role === 'worker',
    schedule: false,
    maintenanceIntervalSeconds: env.KERFWISE_QUEUE_MAINTENANCE_SECONDS,
  });
  boss.on('error', (error) => console.error('Solver queue error', error));
  await boss.start(); // creates or upgrades the pgboss schema under its own advisory lock
  await boss.createQueue(PLAN_RUN_DEAD_QUEUE, { name: PLAN_RUN_DEAD_QUEUE });
  const options = {
    name: PLAN_RUN_QUEUE,
    retryLimit: PLAN_RUN_RETRY_LIMIT,
    retryDelay: 2,
    retryBackoff: true,
    expireInSeconds: env.KERFWISE_PLAN_RUN_EXPIRE_SECONDS,
    deadLetter: PLAN_RUN_DEAD_QUEUE,
  };
  // createQueue leaves an existing queue as it was: update it, so changed settings take effect.
  await boss.createQueue(PLAN_RUN_QUEUE, options);
  await boss.updateQueue(PLAN_RUN_QUEUE, options);
  return boss;
}

/** The process's one queue client, started on first use. */
export function getPlanQueue(url: string, role: 'sender' | 'worker' = 'sender'): Promise<PgBoss> {
  cache.kerfwiseBoss ??= startBoss(url, role).catch((error: unknown) => {
    cache.kerfwiseBoss = undefined;
    throw error;
  });
  return cache.kerfwiseBoss;
}
