import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, planBoards, plans } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { priceCuttingPlan } from '@/lib/pricing';
import type { CreatePlanBody } from '@/lib/validations/plans';
import { getYardSettings } from '@/lib/yard/get-yard-settings';
import { buildSolverInput } from './build-solver-input';
import { getPlanById } from './get-plan';
import { loadPlanningData } from './load-planning-data';
import type { PlanSection, PlanSettings } from './plan-shapes';
import { runSolver } from './run-solver';
import { planBoardRows, summarisePlan } from './summarise-plan';

const DEFAULT_TIME_LIMIT_MS = 2_000;

/** Plans a job section by section with the solver and stores the plan with its saw board list. */
export async function createPlan({ jobId, overrides, userId }: { jobId: number; overrides: CreatePlanBody; userId: number }) {
  const db = await getDb();
  const data = await loadPlanningData(db, jobId);
  if (['released', 'cutting', 'done', 'cancelled'].includes(data.job.status)) {
    throw new AppError('conflict', `Job ${data.job.reference} is ${data.job.status}; only draft or planned jobs can be planned.`);
  }
  if (data.items.length === 0) throw new AppError('invalid', 'The job has no line items to plan yet.');
  const yard = await getYardSettings(db);
  const settings: PlanSettings = {
    kerfMm: overrides.kerfMm ?? yard.kerfMm,
    trimMm: overrides.trimMm ?? yard.trimMm,
    minOffcutMm: overrides.minOffcutMm ?? yard.minOffcutMm,
    useOffcuts: overrides.useOffcuts ?? true,
    stockLengthIds: overrides.stockLengthIds ?? null,
    timeLimitMs: overrides.timeLimitMs ?? DEFAULT_TIME_LIMIT_MS,
  };

  const planSections: PlanSection[] = [];
  for (const section of data.sections.sort((a, b) => a.name.localeCompare(b.name))) {
    const input = buildSolverInput({
      items: data.items.filter((i) => i.sectionId === section.id),
      stock: data.stock.filter((s) => s.sectionId === section.id),
      offcuts: data.offcuts.filter((o) => o.sectionId === section.id),
      settings,
    });
    planSections.push({ sectionId: section.id, sectionName: section.name, input, output: await runSolver(input) });
  }

  const totals = summarisePlan(planSections);
  const price = priceCuttingPlan({
    perCutCharge: yard.perCutChargePence / 100,
    sections: planSections.map((s) => ({
      sectionName: s.sectionName,
      boards: s.output.boards.map((b) => ({ source: b.source, length: b.length, cost: b.cost, cuts: b.pieces.length })),
    })),
  });
  const labels = new Map(data.items.map((i) => [i.id, i.label]));
  const boards = planBoardRows(planSections, labels);

  const planId = await db.transaction(async (tx) => {
    const [plan] = await tx
      .insert(plans)
      .values({
        jobId,
        status: 'planned',
        settings,
        sections: planSections,
        totals,
        price,
        pricePence: Math.round(price.total * 100),
        createdBy: userId,
      })
      .returning({ id: plans.id });
    if (boards.length) await tx.insert(planBoards).values(boards.map((b) => ({ ...b, planId: plan.id })));
    await tx.update(jobs).set({ status: 'planned', updatedAt: new Date() }).where(eq(jobs.id, jobId));
    return plan.id;
  });
  return getPlanById({ planId });
}
