// GET /api/saw/queue – released plans soonest due first, with job, customer, sections and progress
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { getSawQueue } from '@/lib/saw/get-saw-queue';

// Read by the saw and, for live progress, by the office.
export const GET = route('saw:read', async () => {
  return NextResponse.json({ queue: await getSawQueue() });
});
