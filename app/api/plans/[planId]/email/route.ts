// POST /api/plans/[planId]/email – e-mail the quote, a link to accept and pay, and the cut sheet (PDF); 503 if the mail server refuses
import { NextResponse } from 'next/server';
import { appOrigin } from '@/lib/api/request-origin';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { emailCutSheet } from '@/lib/cut-sheets/email-cut-sheet';
import { emailCutSheetBodySchema } from '@/lib/validations/mail';

export const POST = route<{ planId: string }>('mail:send', async ({ req, user, params }) => {
  const planId = parseId(params.planId, 'That plan');
  const body = await parseJsonBody(req, emailCutSheetBodySchema);
  return NextResponse.json(await emailCutSheet({ planId, ...body, userId: user.id, origin: appOrigin(req) }));
});
