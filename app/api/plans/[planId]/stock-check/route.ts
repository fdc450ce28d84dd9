// GET /api/plans/[planId]/stock-check – stock lengths the plan needs more of than are on hand
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { checkPlanStock } from '@/lib/stock/check-plan-stock';

export const GET = route<{ planId: string }>('plans:read', async ({ params }) => {
  const planId = parseId(params.planId, 'That plan');
  return NextResponse.json(await checkPlanStock({ planId }));
});
