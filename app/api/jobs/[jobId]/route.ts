// GET /api/jobs/[jobId] – a job with its line items and plans; PATCH – edit, cancel or reopen it
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { getJobById } from '@/lib/jobs/get-job';
import { updateJob } from '@/lib/jobs/update-job';
import { updateJobBodySchema } from '@/lib/validations/jobs';

export const GET = route<{ jobId: string }>('jobs:read', async ({ params }) => {
  return NextResponse.json(await getJobById({ jobId: parseId(params.jobId, 'That job') }));
});

export const PATCH = route<{ jobId: string }>('jobs:edit', async ({ req, params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const body = await parseJsonBody(req, updateJobBodySchema);
  return NextResponse.json({ job: await updateJob({ jobId, body }) });
});
