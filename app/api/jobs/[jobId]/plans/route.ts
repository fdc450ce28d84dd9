// POST /api/jobs/[jobId]/plans – plan a job with the cutting engine (optional setting overrides)
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { AppError } from '@/lib/errors';
import { createPlan } from '@/lib/plans/create-plan';
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
  const plan = await createPlan({ jobId, overrides, userId: user.id });
  return NextResponse.json(plan, { status: 201 });
});
