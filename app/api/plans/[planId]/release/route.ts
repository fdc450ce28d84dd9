// POST /api/plans/[planId]/release – reserve the plan's offcuts and send it to the saw. 409 if an
// offcut is taken or the quote is not accepted and paid; the owner may override with { override: reason }.
import { NextResponse } from 'next/server';
import { parseOptionalJsonBody } from '@/lib/api/parse-optional-body';
import { parseId, route } from '@/lib/api/route';
import { releasePlan } from '@/lib/plans/release-plan';
import { releasePlanBodySchema } from '@/lib/validations/quotes';

export const POST = route<{ planId: string }>('plans:release', async ({ req, user, params }) => {
  const planId = parseId(params.planId, 'That plan');
  const { override } = await parseOptionalJsonBody(req, releasePlanBodySchema);
  return NextResponse.json(
    await releasePlan({ planId, userId: user.id, isOwner: user.role === 'owner', override }),
  );
});
