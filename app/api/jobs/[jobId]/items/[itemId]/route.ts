// PATCH /api/jobs/[jobId]/items/[itemId] – change a line item; DELETE – remove it
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { deleteJobItem, updateJobItem } from '@/lib/jobs/job-items';
import { updateJobItemBodySchema } from '@/lib/validations/jobs';

type Params = { jobId: string; itemId: string };

export const PATCH = route<Params>('jobs:edit', async ({ req, params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const itemId = parseId(params.itemId, 'That line item');
  const changes = await parseJsonBody(req, updateJobItemBodySchema);
  return NextResponse.json({ item: await updateJobItem({ jobId, itemId, changes }) });
});

export const DELETE = route<Params>('jobs:edit', async ({ params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const itemId = parseId(params.itemId, 'That line item');
  return NextResponse.json(await deleteJobItem({ jobId, itemId }));
});
