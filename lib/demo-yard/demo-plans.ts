// Plans two of the demo jobs with the real cutting engine, and releases one to the saw, so the
// saw queue and plan pages have something to show on a fresh yard.
import { eq } from 'drizzle-orm';
import type { Db } from '@/db/types';
import { solve } from '@/solver';
import { composePlan } from '@/lib/plans/compose-plan';
import { insertPlan } from '@/lib/plans/insert-plan';
import { loadPlanningData } from '@/lib/plans/load-planning-data';
import type { PlanSettings } from '@/lib/plans/plan-shapes';
import { releasePlanInTx } from '@/lib/plans/release-plan-in-tx';
import * as schema from '@/db/schema';

type SeedDb = Db;

/** Job references to plan, and whether to release them to the saw. */
const PLANNED = [
  { reference: 'J-1002', release: true },
  { reference: 'J-1003', release: false },
];

export async function seedDemoPlans(db: SeedDb, userId: number): Promise<void> {
  const [yard] = await db.select().from(schema.yardSettings);
  const settings: PlanSettings = {
    kerfMm: yard.kerfMm,
    trimMm: yard.trimMm,
    minOffcutMm: yard.minOffcutMm,
    useOffcuts: true,
    stockLengthIds: null,
    timeLimitMs: 500,
  };
  for (const { reference, release } of PLANNED) {
    const [job] = await db.select().from(schema.jobs).where(eq(schema.jobs.reference, reference));
    if (!job) continue;
    const data = await loadPlanningData(db, job.id);
    const plan = await composePlan({ data, settings, perCutChargePence: yard.perCutChargePence, solve });
    const planId = await insertPlan(db, { jobId: job.id, settings, plan, userId });
    if (release) await db.transaction((tx) => releasePlanInTx(tx, { planId, userId }));
  }
}
