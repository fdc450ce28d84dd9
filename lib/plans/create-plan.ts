import 'server-only';
import { getDb, type DbOrTx } from '@/db';
import { AppError } from '@/lib/errors';
import type { CreatePlanBody } from '@/lib/validations/plans';
import { getYardSettings } from '@/lib/yard/get-yard-settings';
import { composePlan } from './compose-plan';
import { getPlanById } from './get-plan';
import { loadPlanningData } from './load-planning-data';
import { insertPlan } from './insert-plan';
import type { PlanSettings } from './plan-shapes';
import { runSolver } from './run-solver';

const DEFAULT_TIME_LIMIT_MS = 2_000;
export const PLANNABLE_JOB_STATUSES = ['draft', 'planned'];

/** Everything a planning run needs, after checking the job can be planned now. */
export async function preparePlanning(
  db: DbOrTx,
  { jobId, overrides }: { jobId: number; overrides: CreatePlanBody },
) {
  const data = await loadPlanningData(db, jobId);
  if (!PLANNABLE_JOB_STATUSES.includes(data.job.status)) {
    throw new AppError(
      'conflict',
      `Job ${data.job.reference} is ${data.job.status}; only draft or planned jobs can be planned.`,
    );
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
  // A shortest kept offcut set for this plan overrides each section's own.
  const planned =
    overrides.minOffcutMm === undefined
      ? data
      : { ...data, sections: data.sections.map((s) => ({ ...s, minKeepMm: null })) };
  return { data: planned, settings, perCutChargePence: yard.perCutChargePence };
}

/** Plans a job section by section with the solver and stores the plan with its saw board list. */
export async function createPlan({
  jobId,
  overrides,
  userId,
}: {
  jobId: number;
  overrides: CreatePlanBody;
  userId: number;
}) {
  const db = await getDb();
  const { data, settings, perCutChargePence } = await preparePlanning(db, { jobId, overrides });
  const plan = await composePlan({ data, settings, perCutChargePence, solve: runSolver });
  const planId = await insertPlan(db, { jobId, settings, plan, userId });
  return getPlanById({ planId });
}
