// Two production app instances on one PostgreSQL database, plus one solver worker: the guarantees
// the single-process suites check must hold across instances too. Needs a production build (`.next`,
// built here when missing) and KERFWISE_TEST_DATABASE_URL; run with `npm run test:instances`.
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { chromium } from '@playwright/test';
import { and, eq } from 'drizzle-orm';
import type { Pool } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setDbForTests, type Db } from '@/db';
import { connectServer } from '@/db/server-client';
import * as schema from '@/db/schema';
import { createPlan } from '@/lib/plans/create-plan';
import { killWorker, startWorker, waitFor, type WorkerProcess } from '../server/worker-process';
import { onServer, urlForDatabase } from '../support/server-template';
import { api, signIn, startInstance, stopInstance, waitUntilHealthy, type AppInstance } from './app-instance';

const serverUrl = process.env.KERFWISE_TEST_DATABASE_URL;
const DATABASE = `kerfwise_instances_${process.pid}`;
const DEMO_PASSWORD = 'kerfwise';
const OWNER = 'owner@yard.test';
const HAND = 'hand@yard.test';
const TRIES = 50;

let instances: AppInstance[] = [];
let worker: WorkerProcess | undefined;
let pool: Pool;
let db: Db;
const cookies: Record<string, string[]> = {};

beforeAll(async () => {
  if (!serverUrl) throw new Error('Set KERFWISE_TEST_DATABASE_URL (`.ci/run` starts a test PostgreSQL).');
  if (!existsSync('.next/BUILD_ID')) execFileSync('npx', ['next', 'build'], { stdio: 'inherit' });
  await onServer(serverUrl, [
    `drop database if exists ${DATABASE} with (force)`,
    `create database ${DATABASE}`,
  ]);
  const url = urlForDatabase(serverUrl, DATABASE);
  // Both start on an empty database at once: migrations and the demo seed must run exactly once.
  const env = {
    DATABASE_URL: url,
    KERFWISE_DEMO: '1',
    NEXTAUTH_SECRET: 'two-instance-test-secret-only',
    KERFWISE_SMTP_PORT: '9',
  };
  instances = await Promise.all([startInstance(env), startInstance(env)]);
  await Promise.all(instances.map((i) => waitUntilHealthy(i, 240_000)));
  worker = startWorker(url);
  ({ pool, db } = connectServer(url, 4));
  setDbForTests(db); // the test itself plans through lib/, on the same database
  for (const email of [OWNER, HAND]) {
    // Signed in on the first instance, used on both: sessions are signed tokens, not instance memory.
    const cookie = await signIn(instances[0].base, email, DEMO_PASSWORD);
    cookies[email] = [cookie, cookie];
  }
}, 900_000);

afterAll(async () => {
  setDbForTests(undefined);
  if (worker) await killWorker(worker, 'SIGTERM');
  await Promise.all(instances.map(stopInstance));
  await pool?.end();
  if (serverUrl) await onServer(serverUrl, [`drop database if exists ${DATABASE} with (force)`]);
}, 120_000);

/** Two draft jobs that each need one 1500 mm piece, planned, and one rack offcut that fits either. */
async function twoPlansOneOffcut(sectionId: number, n: number) {
  const [offcut] = await db
    .insert(schema.offcuts)
    .values({ tag: `T-TWO-${n}`, sectionId, lengthMm: 1500, location: 'Rack A1' })
    .returning();
  const planIds: number[] = [];
  for (const side of ['A', 'B']) {
    const [job] = await db
      .insert(schema.jobs)
      .values({ reference: `J-TWO-${n}${side}`, customerName: 'Two-instance test' })
      .returning();
    await db.insert(schema.jobItems).values({ jobId: job.id, sectionId, lengthMm: 1500, quantity: 1 });
    // Generous: the solver stops once the plan meets its bound, and a loaded machine must not change it.
    const plan = await createPlan({ jobId: job.id, overrides: { timeLimitMs: 10_000 }, userId: 2 });
    planIds.push(plan.id);
  }
  return { offcut, planIds };
}

const release = (instance: number, planId: number) =>
  api(instances[instance].base, cookies[OWNER][instance], `/api/plans/${planId}/release`, {
    method: 'POST',
    body: { override: 'Two-instance test: payment is not under test' },
  });

describe('two app instances on one PostgreSQL database', () => {
  it('seeded the demo yard once although both instances started on an empty database', async () => {
    const users = await db.select().from(schema.users);
    expect(users.map((u) => u.email).sort()).toEqual(['hand@yard.test', 'owner@yard.test', 'saw@yard.test']);
  });

  it(`lets exactly one of two releases win an offcut, ${TRIES} times over, one release on each instance`, async () => {
    const [section] = await db.select().from(schema.sections).where(eq(schema.sections.code, 'T47100'));
    await db
      .update(schema.offcuts)
      .set({ status: 'scrapped' })
      .where(and(eq(schema.offcuts.sectionId, section.id), eq(schema.offcuts.status, 'available')));
    for (let n = 1; n <= TRIES; n++) {
      const { offcut, planIds } = await twoPlansOneOffcut(section.id, n);
      const results = await Promise.all([release(0, planIds[0]), release(1, planIds[1])]);
      expect(results.map((r) => r.status).sort(), `try ${n}`).toEqual([200, 409]);
      const winner = planIds[results.findIndex((r) => r.status === 200)];
      const [o] = await db.select().from(schema.offcuts).where(eq(schema.offcuts.id, offcut.id));
      expect(o.reservedByPlanId, `try ${n}`).toBe(winner);
    }
  }, 600_000);

  it('confirms each board of a released plan once when both instances confirm it at the same moment', async () => {
    const [plan] = await db
      .select()
      .from(schema.plans)
      .where(eq(schema.plans.status, 'released'))
      .orderBy(schema.plans.id);
    const boards = await db.select().from(schema.planBoards).where(eq(schema.planBoards.planId, plan.id));
    expect(boards.length).toBeGreaterThan(0);
    for (const board of boards) {
      const path = `/api/plans/${plan.id}/boards/${board.boardNo}/done`;
      const both = await Promise.all(
        [0, 1].map((i) => api(instances[i].base, cookies[OWNER][i], path, { method: 'POST', body: {} })),
      );
      expect(both.map((r) => r.status)).toEqual([200, 200]);
      expect(both.map((r) => r.json.alreadyDone).sort()).toEqual([false, true]);
    }
    const stockBoards = boards.filter((b) => b.source === 'stock').length;
    const cuts = await db
      .select()
      .from(schema.stockMovements)
      .where(and(eq(schema.stockMovements.planId, plan.id), eq(schema.stockMovements.kind, 'stock_cut')));
    expect(cuts).toHaveLength(stockBoards);
    // On hand equals the sum of movements for every stock length, across both instances' writes.
    const { rows } = await pool.query<{ on_hand: number | null; total: number }>(
      `select sl.on_hand, coalesce(sum(m.quantity_delta), 0)::int as total
         from stock_lengths sl left join stock_movements m on m.stock_length_id = sl.id group by sl.id`,
    );
    for (const r of rows.filter((x) => x.on_hand !== null)) expect(r.on_hand).toBe(r.total);
  }, 120_000);

  it('plans through the queue: 202 with a run id on one instance, followed and read on the other', async () => {
    const hand = cookies[HAND];
    const [section] = await db.select().from(schema.sections).where(eq(schema.sections.code, 'T47100'));
    const [draft] = await db
      .insert(schema.jobs)
      .values({ reference: 'J-TWO-Q', customerName: 'Two-instance test' })
      .returning();
    await db
      .insert(schema.jobItems)
      .values({ jobId: draft.id, sectionId: section.id, lengthMm: 2400, quantity: 3 });
    const queued = await api(instances[0].base, hand[0], `/api/jobs/${draft.id}/plans`, {
      method: 'POST',
      body: { timeLimitMs: 300 },
    });
    expect(queued.status).toBe(202);
    const run = await waitFor(
      'the worker to finish the run',
      async () => {
        const r = await api(instances[1].base, hand[1], `/api/plan-runs/${queued.json.runId}`);
        return r.json.status === 'done' ? r.json : null;
      },
      120_000,
    );
    const listed = await api(instances[1].base, hand[1], `/api/jobs/${draft.id}/plans`);
    expect(listed.json.plans.map((p: { id: number }) => p.id)).toEqual([run.planId]);
  }, 180_000);

  // Last: it stops the worker, so the run waits in the queue until the yard hand calls it off.
  it('lets the yard hand stop a queued plan from the job page in a real browser; no plan is stored', async () => {
    if (worker) await killWorker(worker, 'SIGTERM');
    worker = undefined;
    const [section] = await db.select().from(schema.sections).where(eq(schema.sections.code, 'T47100'));
    const [draft] = await db
      .insert(schema.jobs)
      .values({ reference: 'J-TWO-STOP', customerName: 'Two-instance test' })
      .returning();
    await db
      .insert(schema.jobItems)
      .values({ jobId: draft.id, sectionId: section.id, lengthMm: 2400, quantity: 3 });
    const browser = await chromium.launch({ executablePath: '/usr/bin/chromium' });
    try {
      const [name, value] = cookies[HAND][1].split(/=(.*)/s);
      const context = await browser.newContext();
      await context.addCookies([{ name, value, url: instances[1].base }]);
      const page = await context.newPage();
      await page.goto(`${instances[1].base}/jobs/${draft.id}`);
      await page.getByRole('button', { name: 'Plan this job' }).click();
      await page.getByText('Waiting for a free solver…').waitFor({ timeout: 30_000 });
      await page.getByRole('button', { name: 'Stop planning' }).click();
      await page.getByText('This planning run was cancelled.').waitFor({ timeout: 30_000 });
      expect(await page.getByRole('button', { name: 'Plan this job' }).isEnabled()).toBe(true);
    } finally {
      await browser.close();
    }
    const runs = await pool.query<{ status: string }>('select status from plan_runs where job_id = $1', [
      draft.id,
    ]);
    expect(runs.rows.map((r) => r.status)).toEqual(['cancelled']);
    const listed = await api(instances[0].base, cookies[HAND][0], `/api/jobs/${draft.id}/plans`);
    expect(listed.json.plans).toEqual([]);
  }, 180_000);
});
