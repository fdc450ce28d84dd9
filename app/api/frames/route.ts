// GET /api/frames – saved frame schedules, latest first
// POST /api/frames – save a new frame schedule
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { createFrameSchedule, listFrameSchedules } from '@/lib/frames-data/frame-schedules';
import { saveFrameScheduleBodySchema } from '@/lib/validations/frames';

export const GET = route('frames:edit', async () => {
  return NextResponse.json({ schedules: await listFrameSchedules() });
});

export const POST = route('frames:edit', async ({ req, user }) => {
  const body = await parseJsonBody(req, saveFrameScheduleBodySchema);
  return NextResponse.json(
    { schedule: await createFrameSchedule({ body, userId: user.id }) },
    { status: 201 },
  );
});
