// POST /api/plans/[planId]/boards/[boardNo]/defect – record a bad board and re-plan its pieces at once
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { reportDefect } from '@/lib/saw/report-defect';
import { reportDefectBodySchema } from '@/lib/validations/saw';

export const POST = route<{ planId: string; boardNo: string }>('saw:cut', async ({ req, user, params }) => {
  const planId = parseId(params.planId, 'That plan');
  const boardNo = parseId(params.boardNo, 'That board');
  const body = await parseJsonBody(req, reportDefectBodySchema);
  return NextResponse.json(await reportDefect({ planId, boardNo, userId: user.id, ...body }));
});
