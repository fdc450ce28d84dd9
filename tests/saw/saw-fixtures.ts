// Small jobs with a known shape for the saw tests, planned and released through the real API.
import { and, eq } from 'drizzle-orm';
import { POST as planJob } from '@/app/api/jobs/[jobId]/plans/route';
import { POST as release } from '@/app/api/plans/[planId]/release/route';
import * as schema from '@/db/schema';
import type { Db } from '@/db';
import { actAs, AS, call } from '../support/api';

export async function sectionByCode(db: Db, code: string) {
  const [section] = await db.select().from(schema.sections).where(eq(schema.sections.code, code));
  return section;
}

/** Scraps the demo rack of a section so a test's own offcuts are the only ones. */
export async function clearRack(db: Db, sectionId: number) {
  await db
    .update(schema.offcuts)
    .set({ status: 'scrapped' })
    .where(and(eq(schema.offcuts.sectionId, sectionId), eq(schema.offcuts.status, 'available')));
}

export async function addOffcut(
  db: Db,
  { tag, sectionId, lengthMm }: { tag: string; sectionId: number; lengthMm: number },
) {
  const [offcut] = await db
    .insert(schema.offcuts)
    .values({ tag, sectionId, lengthMm, location: 'Rack A1' })
    .returning();
  return offcut;
}

/** Creates a job with the given pieces, plans it as the yard hand and (by default) releases it. */
export async function releasedJob(
  db: Db,
  {
    reference,
    sectionId,
    pieces,
    releaseIt = true,
  }: { reference: string; sectionId: number; pieces: [number, number, string][]; releaseIt?: boolean },
) {
  const [job] = await db
    .insert(schema.jobs)
    .values({ reference, customerName: 'Test customer', dueDate: '2026-11-21' })
    .returning();
  await db.insert(schema.jobItems).values(
    pieces.map(([lengthMm, quantity, label], position) => ({
      jobId: job.id,
      sectionId,
      lengthMm,
      quantity,
      label,
      position,
    })),
  );
  actAs(AS.hand);
  const planned = await call(planJob, {
    method: 'POST',
    params: { jobId: String(job.id) },
    // Generous: the solver stops once the plan meets its bound, and a loaded machine must not change the plan.
    body: { timeLimitMs: 10_000 },
  });
  if (planned.status !== 201) throw new Error(`planning failed: ${JSON.stringify(planned.json)}`);
  const planId = planned.json.id as number;
  if (releaseIt) {
    // The owner's override: payment before release is tested in tests/quotes, not here.
    actAs(AS.owner);
    const released = await call(release, {
      method: 'POST',
      params: { planId: String(planId) },
      body: { override: 'Saw test fixture: payment is not under test' },
    });
    if (released.status !== 200) throw new Error(`release failed: ${JSON.stringify(released.json)}`);
  }
  actAs(AS.saw);
  return { jobId: job.id, planId };
}

export async function boardsOf(db: Db, planId: number) {
  return db
    .select()
    .from(schema.planBoards)
    .where(eq(schema.planBoards.planId, planId))
    .orderBy(schema.planBoards.boardNo);
}

export async function movementsOf(db: Db, planId: number) {
  return db
    .select()
    .from(schema.stockMovements)
    .where(eq(schema.stockMovements.planId, planId))
    .orderBy(schema.stockMovements.id);
}

export async function releasedDemoPlanId(db: Db) {
  const [plan] = await db
    .select()
    .from(schema.plans)
    .where(eq(schema.plans.status, 'released'))
    .orderBy(schema.plans.id);
  return plan.id;
}
