// POST /api/plans/[planId]/unrelease – take a plan back from the saw and return its offcuts to the rack
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { unreleasePlan } from '@/lib/plans/unrelease-plan';

export const POST = route<{ planId: string }>('plans:release', async ({ user, params }) => {
  return NextResponse.json(
    await unreleasePlan({ planId: parseId(params.planId, 'That plan'), userId: user.id }),
  );
});
