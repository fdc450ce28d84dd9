// GET /api/frames/[scheduleId] – one frame schedule with its panels and the jobs made from it
// PUT /api/frames/[scheduleId] – replace its name, customer, unit and panels
// DELETE /api/frames/[scheduleId] – delete it, unless a job came from it
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import {
  deleteFrameSchedule,
  getFrameScheduleById,
  updateFrameSchedule,
} from '@/lib/frames-data/frame-schedules';
import { saveFrameScheduleBodySchema } from '@/lib/validations/frames';

type Params = { scheduleId: string };
const WHAT = 'That frame schedule';

export const GET = route<Params>('frames:edit', async ({ params }) => {
  const id = parseId(params.scheduleId, WHAT);
  return NextResponse.json({ schedule: await getFrameScheduleById({ id }) });
});

export const PUT = route<Params>('frames:edit', async ({ req, params }) => {
  const id = parseId(params.scheduleId, WHAT);
  const body = await parseJsonBody(req, saveFrameScheduleBodySchema);
  return NextResponse.json({ schedule: await updateFrameSchedule({ id, body }) });
});

export const DELETE = route<Params>('frames:edit', async ({ params }) => {
  const id = parseId(params.scheduleId, WHAT);
  await deleteFrameSchedule({ id });
  return new NextResponse(null, { status: 204 });
});
