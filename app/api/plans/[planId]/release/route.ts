// POST /api/plans/[planId]/release – reserve the plan's offcuts and send it to the saw (409 if one is taken)
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { releasePlan } from '@/lib/plans/release-plan';

export const POST = route<{ planId: string }>('plans:release', async ({ user, params }) => {
  return NextResponse.json(
    await releasePlan({ planId: parseId(params.planId, 'That plan'), userId: user.id }),
  );
});
