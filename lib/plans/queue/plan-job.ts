// Planning a job from a route: on a PostgreSQL server the run goes to the solver workers' queue and
// the caller gets a run id to follow; embedded, the solve runs here (in a worker thread) as before.
import 'server-only';
import { getDb } from '@/db';
import { databaseUrl } from '@/db/env';
import type { CreatePlanBody } from '@/lib/validations/plans';
import { createPlan } from '../create-plan';
import { enqueuePlanRun } from './enqueue-plan-run';

type PlanJobArgs = { jobId: number; overrides: CreatePlanBody; userId: number };
export type PlanJobResult =
  { kind: 'queued'; runId: number } | { kind: 'planned'; plan: Awaited<ReturnType<typeof createPlan>> };

export async function planJob(args: PlanJobArgs): Promise<PlanJobResult> {
  const queueUrl = databaseUrl();
  if (!queueUrl) return { kind: 'planned', plan: await createPlan(args) };
  return { kind: 'queued', runId: await enqueuePlanRun(await getDb(), queueUrl, args) };
}
