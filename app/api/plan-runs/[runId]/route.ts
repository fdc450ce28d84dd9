// GET /api/plan-runs/[runId] – a queued planning run: queued / running / done / failed / cancelled,
// with sections solved so far and, once done, the plan's id
import { NextResponse } from 'next/server';
import { getDb } from '@/db';
import { parseId, route } from '@/lib/api/route';
import { cancelPlanRun, getPlanRun, planRunView } from '@/lib/plans/queue/plan-runs';

export const GET = route<{ runId: string }>('plans:read', async ({ params }) => {
  const runId = parseId(params.runId, 'That planning run');
  return NextResponse.json(planRunView(await getPlanRun(await getDb(), runId)));
});

// DELETE /api/plan-runs/[runId] – cancel a run that is still queued or running
export const DELETE = route<{ runId: string }>('plans:create', async ({ params }) => {
  const runId = parseId(params.runId, 'That planning run');
  return NextResponse.json(planRunView(await cancelPlanRun(await getDb(), runId)));
});
