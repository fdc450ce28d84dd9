// POST /api/plans/[planId]/undo-board – take back the plan's most recent board confirmation
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { undoLastBoard } from '@/lib/saw/undo-last-board';

export const POST = route<{ planId: string }>('saw:cut', async ({ params, user }) => {
  return NextResponse.json(
    await undoLastBoard({ planId: parseId(params.planId, 'That plan'), userId: user.id }),
  );
});
