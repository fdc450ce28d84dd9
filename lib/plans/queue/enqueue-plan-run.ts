import 'server-only';
import type { Db } from '@/db';
import { planRuns } from '@/db/schema';
import type { CreatePlanBody } from '@/lib/validations/plans';
import { preparePlanning } from '../create-plan';
import { getPlanQueue, PLAN_RUN_QUEUE, type PlanRunMessage } from './plan-queue';

/** Checks the job can be planned, records a queued run and hands it to the solver workers. */
export async function enqueuePlanRun(
  db: Db,
  queueUrl: string,
  { jobId, overrides, userId }: { jobId: number; overrides: CreatePlanBody; userId: number },
): Promise<number> {
  const { data } = await preparePlanning(db, { jobId, overrides });
  const [run] = await db
    .insert(planRuns)
    .values({ jobId, overrides, sectionsTotal: data.sections.length, createdBy: userId })
    .returning({ id: planRuns.id });
  const boss = await getPlanQueue(queueUrl);
  await boss.send(PLAN_RUN_QUEUE, { runId: run.id } satisfies PlanRunMessage);
  return run.id;
}
