// GET /api/plans/[planId] – a plan: per section the solver's input and output, totals, price, boards
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { getPlanById } from '@/lib/plans/get-plan';

export const GET = route<{ planId: string }>('plans:read', async ({ params }) => {
  return NextResponse.json(await getPlanById({ planId: parseId(params.planId, 'That plan') }));
});
