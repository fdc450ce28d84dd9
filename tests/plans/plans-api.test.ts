import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { POST as planJob } from '@/app/api/jobs/[jobId]/plans/route';
import { GET as getPlan } from '@/app/api/plans/[planId]/route';
import { POST as release } from '@/app/api/plans/[planId]/release/route';
import { POST as unrelease } from '@/app/api/plans/[planId]/unrelease/route';
import * as schema from '@/db/schema';
import type { PlanSection } from '@/lib/plans/plan-shapes';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { checkPlan } from '../solver/plan-checker';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

// Payment before release is tested in tests/quotes; here the owner overrides it.
const releaseAsOwner = (planId: number) => {
  actAs(AS.owner);
  return call(release, {
    method: 'POST',
    params: { planId: String(planId) },
    body: { override: 'Release test: payment is not under test' },
  });
};

const plan = (jobId: number, body?: unknown) =>
  call(planJob, { method: 'POST', params: { jobId: String(jobId) }, body: body ?? {} });

/** Two draft jobs that each need a 1500 mm piece, and one rack offcut that fits it exactly. */
async function twoJobsOneOffcut() {
  const [section] = await t.db.select().from(schema.sections).where(eq(schema.sections.code, 'T47100'));
  // Clear the demo rack for this section so the test's offcut is the only one.
  await t.db
    .update(schema.offcuts)
    .set({ status: 'scrapped' })
    .where(eq(schema.offcuts.sectionId, section.id));
  const [offcut] = await t.db
    .insert(schema.offcuts)
    .values({ tag: 'T-TEST', sectionId: section.id, lengthMm: 1500, location: 'Rack A1' })
    .returning();
  const jobIds: number[] = [];
  for (const reference of ['J-T1', 'J-T2']) {
    const [job] = await t.db.insert(schema.jobs).values({ reference, customerName: 'Test' }).returning();
    await t.db
      .insert(schema.jobItems)
      .values({ jobId: job.id, sectionId: section.id, lengthMm: 1500, quantity: 1 });
    jobIds.push(job.id);
  }
  return { offcut, jobIds };
}

describe('POST /api/jobs/[jobId]/plans', () => {
  it('is refused signed out (401) and to saw operators (403)', async () => {
    actAs(AS.nobody);
    expect((await plan(1)).status).toBe(401);
    actAs(AS.saw);
    expect((await plan(1)).status).toBe(403);
  });

  it('answers 422 for bad overrides and 404 for an unknown job', async () => {
    actAs(AS.hand);
    const bad = await plan(1, { kerfMm: -1, trimMm: 2.5 });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual(['kerfMm', 'trimMm']);
    expect((await plan(1, { colour: 'red' })).status).toBe(422);
    expect((await plan(9999)).status).toBe(404);
  });

  it('stores a plan whose every section passes the independent plan checker', async () => {
    actAs(AS.hand);
    const res = await plan(1, { timeLimitMs: 500 });
    expect(res.status).toBe(201);
    const body = res.json as {
      id: number;
      jobId: number;
      status: string;
      sections: PlanSection[];
      boards: unknown[];
    };
    expect(body).toMatchObject({ jobId: 1, status: 'planned' });
    expect(body.sections.length).toBeGreaterThan(0);
    for (const section of body.sections) {
      expect(section.input.kerf).toBe(3);
      expect(checkPlan(section.input, section.output)).toEqual([]);
    }
    const boardCount = body.sections.reduce((n, s) => n + s.output.boards.length, 0);
    expect(body.boards).toHaveLength(boardCount);
    const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.id, 1));
    expect(job.status).toBe('planned');

    actAs(AS.saw);
    expect((await call(getPlan, { params: { planId: String(body.id) } })).status).toBe(403);
    actAs(AS.owner);
    const read = await call(getPlan, { params: { planId: String(body.id) } });
    expect(read.status).toBe(200);
    expect(read.json.sections).toEqual(body.sections);
  });

  it('uses a rack offcut before new stock when one fits', async () => {
    actAs(AS.hand);
    const { offcut, jobIds } = await twoJobsOneOffcut();
    const res = await plan(jobIds[0]);
    expect(res.status).toBe(201);
    expect(res.json.boards).toHaveLength(1);
    expect(res.json.boards[0]).toMatchObject({ source: 'offcut', offcutId: offcut.id });
  });

  it('refuses to plan a job without line items', async () => {
    actAs(AS.hand);
    const [job] = await t.db
      .insert(schema.jobs)
      .values({ reference: 'J-EMPTY', customerName: 'Nobody' })
      .returning();
    const res = await plan(job.id);
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/no line items/);
  });
});

describe('releasing a plan', () => {
  it('reserves its offcuts, marks the job released and records stock movements', async () => {
    actAs(AS.hand);
    const { offcut, jobIds } = await twoJobsOneOffcut();
    const planned = await plan(jobIds[0]);
    const res = await releaseAsOwner(planned.json.id);
    expect(res.status).toBe(200);
    const [o] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, offcut.id));
    expect(o).toMatchObject({ status: 'reserved', reservedByPlanId: planned.json.id });
    const moves = await t.db
      .select()
      .from(schema.stockMovements)
      .where(eq(schema.stockMovements.offcutId, offcut.id));
    expect(moves.map((m) => m.kind)).toContain('offcut_reserved');
    const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.id, jobIds[0]));
    expect(job.status).toBe('released');
  });

  it('lets exactly one of two concurrent releases win an offcut; the loser changes nothing', async () => {
    actAs(AS.hand);
    const { offcut, jobIds } = await twoJobsOneOffcut();
    const a = await plan(jobIds[0]);
    const b = await plan(jobIds[1]);
    const results = await Promise.all([a, b].map((p) => releaseAsOwner(p.json.id)));
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const loser = results.find((r) => r.status === 409)!;
    expect(loser.json.error).toContain('T-TEST');
    expect(loser.json.details.offcuts[0].tag).toBe('T-TEST');
    const loserPlanId = results[0].status === 409 ? a.json.id : b.json.id;
    const [loserPlan] = await t.db.select().from(schema.plans).where(eq(schema.plans.id, loserPlanId));
    expect(loserPlan.status).toBe('planned');
    const [o] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, offcut.id));
    expect(o.reservedByPlanId).not.toBe(loserPlanId);
  });

  it('taking a plan back returns its offcuts to the rack', async () => {
    actAs(AS.hand);
    const { offcut, jobIds } = await twoJobsOneOffcut();
    const planned = await plan(jobIds[0]);
    await releaseAsOwner(planned.json.id);
    const res = await call(unrelease, { method: 'POST', params: { planId: String(planned.json.id) } });
    expect(res.status).toBe(200);
    const [o] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, offcut.id));
    expect(o).toMatchObject({ status: 'available', reservedByPlanId: null });
    expect(
      (await call(unrelease, { method: 'POST', params: { planId: String(planned.json.id) } })).status,
    ).toBe(409);
  });

  it('is refused to saw operators', async () => {
    actAs(AS.saw);
    expect((await call(release, { method: 'POST', params: { planId: '1' } })).status).toBe(403);
  });
});
