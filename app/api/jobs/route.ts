// GET /api/jobs – jobs with filters (q, customer, status, dueFrom, dueTo); POST /api/jobs – create a job
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { createJob } from '@/lib/jobs/create-job';
import { listJobs } from '@/lib/jobs/list-jobs';
import { createJobBodySchema, listJobsQuerySchema } from '@/lib/validations/jobs';

export const GET = route('jobs:read', async ({ req }) => {
  const params = Object.fromEntries([...req.nextUrl.searchParams].filter(([, v]) => v !== ''));
  const query = listJobsQuerySchema.parse(params);
  return NextResponse.json({ jobs: await listJobs(query) });
});

export const POST = route('jobs:edit', async ({ req, user }) => {
  const body = await parseJsonBody(req, createJobBodySchema);
  return NextResponse.json({ job: await createJob({ body, userId: user.id }) }, { status: 201 });
});
