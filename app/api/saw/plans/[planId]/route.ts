// GET /api/saw/plans/[planId] – a plan board by board as the saw station shows it
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { getSawPlan } from '@/lib/saw/get-saw-plan';

export const GET = route<{ planId: string }>('saw:read', async ({ params }) => {
  return NextResponse.json(await getSawPlan({ planId: parseId(params.planId, 'That plan') }));
});
