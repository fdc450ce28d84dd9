// POST /api/jobs/[jobId]/plans – plan a job with the cutting engine (optional setting overrides):
// 201 with the plan, or 202 with { runId } when the solver workers take it (server mode)
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { AppError } from '@/lib/errors';
import { getJobById } from '@/lib/jobs/get-job';
import { planJob } from '@/lib/plans/queue/plan-job';
import { createPlanBodySchema } from '@/lib/validations/plans';

export const POST = route<{ jobId: string }>('plans:create', async ({ req, user, params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const text = await req.text();
  let raw: unknown = {};
  try {
    raw = text.trim() ? JSON.parse(text) : {};
  } catch {
    throw new AppError('invalid', 'The request body must be JSON.');
  }
  const overrides = createPlanBodySchema.parse(raw);
  const result = await planJob({ jobId, overrides, userId: user.id });
  if (result.kind === 'queued') return NextResponse.json({ runId: result.runId }, { status: 202 });
  return NextResponse.json(result.plan, { status: 201 });
});

// GET /api/jobs/[jobId]/plans – the job's plans, newest first
export const GET = route<{ jobId: string }>('plans:read', async ({ params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const { job, plans } = await getJobById({ jobId });
  return NextResponse.json({ jobId: job.id, plans });
});
