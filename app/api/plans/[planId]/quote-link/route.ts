// POST /api/plans/[planId]/quote-link – a new expiring link to the plan's quote for the customer;
// DELETE – revoke every open link to it
import { NextResponse } from 'next/server';
import { appOrigin } from '@/lib/api/request-origin';
import { parseId, route } from '@/lib/api/route';
import { createQuoteLink, revokeQuoteLinks } from '@/lib/quotes/quote-links';

export const POST = route<{ planId: string }>('quotes:share', async ({ req, user, params }) => {
  const planId = parseId(params.planId, 'That plan');
  return NextResponse.json(await createQuoteLink({ planId, userId: user.id, origin: appOrigin(req) }), {
    status: 201,
  });
});

export const DELETE = route<{ planId: string }>('quotes:share', async ({ params }) => {
  return NextResponse.json(await revokeQuoteLinks({ planId: parseId(params.planId, 'That plan') }));
});
