// POST /api/frames/[scheduleId]/send-to-job – add the schedule's cut list to a new or existing job
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { can } from '@/lib/auth/permissions';
import { AppError } from '@/lib/errors';
import { sendScheduleToJob } from '@/lib/frames-data/send-schedule-to-job';
import { sendScheduleToJobBodySchema } from '@/lib/validations/frames';

export const POST = route<{ scheduleId: string }>('frames:edit', async ({ req, params, user }) => {
  // Sending writes job items, so the role must also be allowed to edit jobs.
  if (!can(user.role, 'jobs:edit')) throw new AppError('forbidden', 'Your role does not allow this.');
  const scheduleId = parseId(params.scheduleId, 'That frame schedule');
  const body = await parseJsonBody(req, sendScheduleToJobBodySchema);
  const { jobId, lineCount } = await sendScheduleToJob({ scheduleId, body, userId: user.id });
  return NextResponse.json({ jobId, lineCount }, { status: 201 });
});
