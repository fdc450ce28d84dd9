// GET /api/saw/queue – released plans soonest due first, with job, customer, sections and progress
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { getSawQueue } from '@/lib/saw/get-saw-queue';

// Read by the saw and, for live progress on the job list, by the office (no prices or contact details).
export const GET = route('saw:progress', async () => {
  return NextResponse.json({ queue: await getSawQueue() });
});
