// POST /api/frames/[scheduleId]/copy – a new schedule with the same panels, to edit separately
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { copyFrameSchedule } from '@/lib/frames-data/frame-schedules';

export const POST = route<{ scheduleId: string }>('frames:edit', async ({ params, user }) => {
  const id = parseId(params.scheduleId, 'That frame schedule');
  return NextResponse.json({ schedule: await copyFrameSchedule({ id, userId: user.id }) }, { status: 201 });
});
