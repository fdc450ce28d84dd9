// Server mode only: planning runs go through the pg-boss queue to `npm run worker` processes.
import { eq, sql } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import * as schema from '@/db/schema';
import { enqueuePlanRun } from '@/lib/plans/queue/enqueue-plan-run';
import {
  getPlanQueue,
  PLAN_RUN_DEAD_QUEUE,
  PLAN_RUN_QUEUE,
  PLAN_RUN_RETRY_LIMIT,
} from '@/lib/plans/queue/plan-queue';
import { DEAD_RUN_MESSAGE, startPlanWorker } from '@/lib/plans/queue/plan-worker';
import { cancelPlanRun, getPlanRun } from '@/lib/plans/queue/plan-runs';
import { AS } from '../support/api';
import { createTestDb, type TestDb } from '../support/test-db';
import { killWorker, startWorker, waitFor, type WorkerProcess } from './worker-process';

let t: TestDb;
let workers: WorkerProcess[] = [];
beforeEach(async () => {
  t = await createTestDb();
});
afterEach(async () => {
  await Promise.all(workers.map((w) => killWorker(w, 'SIGTERM')));
  workers = [];
  // Rows are reset between tests and run ids start again at 1, but the queue's own tables are not:
  // a retry left by a killed worker would reach the next test as a run of the same id.
  await t.db.execute(
    sql`do $$ begin if to_regclass('pgboss.job') is not null then delete from pgboss.job; end if; end $$`,
  );
  await t.close();
});

// Short expiry so a killed worker's run is retried within the test. A run's expiry is fixed when it
// is sent, so this process (which sends) needs it as well as the workers.
// Workers inherit this process's environment, so they solve at normal priority too (tests/support/setup.ts).
const QUICK_RETRY = { KERFWISE_PLAN_RUN_EXPIRE_SECONDS: '8', KERFWISE_QUEUE_MAINTENANCE_SECONDS: '1' };
Object.assign(process.env, QUICK_RETRY);

async function jobByReference(reference: string) {
  const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.reference, reference));
  return job;
}

const plansOf = (jobId: number) => t.db.select().from(schema.plans).where(eq(schema.plans.jobId, jobId));

describe('solver runs on the queue', () => {
  it('a queued run is solved by a worker and its plan stored once; a cancelled run stores nothing', async () => {
    const job = await jobByReference('J-1001');
    const before = (await plansOf(job.id)).length;
    const cancelled = await enqueuePlanRun(t.db, t.url!, { jobId: job.id, overrides: {}, userId: AS.hand });
    await cancelPlanRun(t.db, cancelled);
    const runId = await enqueuePlanRun(t.db, t.url!, {
      jobId: job.id,
      overrides: { timeLimitMs: 500 },
      userId: AS.hand,
    });
    expect((await getPlanRun(t.db, runId)).status).toBe('queued');

    workers.push(startWorker(t.url!, QUICK_RETRY));
    const done = await waitFor(
      'the run to finish',
      async () => {
        const run = await getPlanRun(t.db, runId);
        return run.status === 'done' ? run : null;
      },
      90_000,
    );
    expect(done.planId).not.toBeNull();
    expect(done.sectionsDone).toBe(done.sectionsTotal);
    expect((await plansOf(job.id)).length).toBe(before + 1);
    expect((await getPlanRun(t.db, cancelled)).status).toBe('cancelled');
  }, 150_000);

  it('a worker killed in the middle of a run: the run is retried by another worker and stored once', async () => {
    const job = await jobByReference('J-1001');
    const before = (await plansOf(job.id)).length;
    // A long search, so the first worker is surely mid-run when it is killed.
    const runId = await enqueuePlanRun(t.db, t.url!, {
      jobId: job.id,
      overrides: { timeLimitMs: 4000 },
      userId: AS.hand,
    });
    const first = startWorker(t.url!, QUICK_RETRY);
    workers.push(first);
    await waitFor(
      'the first worker to start the run',
      async () => (await getPlanRun(t.db, runId)).status === 'running',
      90_000,
    );
    await killWorker(first);
    expect((await getPlanRun(t.db, runId)).status).toBe('running');

    const second = startWorker(t.url!, QUICK_RETRY);
    workers.push(second);
    const done = await waitFor(
      () => `the retried run to finish. Worker output:\n${first.output()}\n---\n${second.output()}`,
      async () => {
        const run = await getPlanRun(t.db, runId);
        return run.status === 'done' ? run : null;
      },
      120_000,
    );
    expect(done.attempts).toBeGreaterThanOrEqual(2);
    const plans = await plansOf(job.id);
    expect(plans.length).toBe(before + 1);
    expect(plans.filter((p) => p.id === done.planId)).toHaveLength(1);
  }, 200_000);

  it('a run that fails every try is retried with growing delays, then marked failed with a clear message', async () => {
    const job = await jobByReference('J-1001');
    const before = (await plansOf(job.id)).length;
    const runId = await enqueuePlanRun(t.db, t.url!, { jobId: job.id, overrides: {}, userId: AS.hand });
    // An in-process worker whose engine fails every time, as a crash would.
    const tries: number[] = [];
    const boss = await getPlanQueue(t.url!);
    await startPlanWorker(t.db, boss, {
      processRun: async () => {
        tries.push(Date.now());
        throw new Error('the cutting engine stopped (test)');
      },
      log: () => undefined,
    });
    try {
      const failed = await waitFor(
        'the run to be given up on',
        async () => {
          const run = await getPlanRun(t.db, runId);
          return run.status === 'failed' ? run : null;
        },
        90_000,
      );
      expect(failed.error).toBe(DEAD_RUN_MESSAGE);
      expect(tries).toHaveLength(PLAN_RUN_RETRY_LIMIT + 1);
      // Backoff: retry n waits 2^n to 2^(n+1) seconds (retryDelay 2), so each gap is at least 2^n s.
      const gaps = tries.slice(1).map((at, i) => at - tries[i]);
      gaps.forEach((gap, i) => expect(gap).toBeGreaterThanOrEqual(2 ** (i + 1) * 1000 - 500));
      expect((await plansOf(job.id)).length).toBe(before);
    } finally {
      await boss.offWork(PLAN_RUN_QUEUE);
      await boss.offWork(PLAN_RUN_DEAD_QUEUE);
    }
  }, 120_000);
});
