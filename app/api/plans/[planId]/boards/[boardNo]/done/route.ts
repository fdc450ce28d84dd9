// POST /api/plans/[planId]/boards/[boardNo]/done – confirm a board cut (idempotent); names any new offcut's tag.
// 409 when the stock count shows the board's length is gone, until the operator sends { boardThere: true }.
import { NextResponse } from 'next/server';
import { parseOptionalJsonBody } from '@/lib/api/parse-optional-body';
import { parseId, route } from '@/lib/api/route';
import { confirmBoard } from '@/lib/saw/confirm-board';
import { confirmBoardBodySchema } from '@/lib/validations/saw';

export const POST = route<{ planId: string; boardNo: string }>('saw:cut', async ({ req, user, params }) => {
  const planId = parseId(params.planId, 'That plan');
  const boardNo = parseId(params.boardNo, 'That board');
  const body = await parseOptionalJsonBody(req, confirmBoardBodySchema);
  return NextResponse.json(
    await confirmBoard({
      planId,
      boardNo,
      userId: user.id,
      location: body.location,
      boardThere: body.boardThere,
    }),
  );
});
