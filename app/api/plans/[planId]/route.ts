// GET /api/plans/[planId] – a plan: per section the solver's input and output, totals, price, boards,
// and its quote (number, validity, lines, net, VAT, gross in whole pence)
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { getPlanWithQuote } from '@/lib/plans/get-plan-with-quote';

export const GET = route<{ planId: string }>('plans:read', async ({ params }) => {
  const planId = parseId(params.planId, 'That plan');
  return NextResponse.json(await getPlanWithQuote({ planId }));
});
