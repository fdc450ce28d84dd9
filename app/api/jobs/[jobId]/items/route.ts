// POST /api/jobs/[jobId]/items – add one line item to a job's cut list
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { addJobItem } from '@/lib/jobs/job-items';
import { jobItemBodySchema } from '@/lib/validations/jobs';

export const POST = route<{ jobId: string }>('jobs:edit', async ({ req, params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const item = await parseJsonBody(req, jobItemBodySchema);
  return NextResponse.json({ item: await addJobItem({ jobId, item }) }, { status: 201 });
});
