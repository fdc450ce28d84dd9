// GET /api/quote-links/[token] – public: the quote a customer's link opens (404 unknown, 410 expired or revoked)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { getCustomerQuote } from '@/lib/quotes/get-customer-quote';

export const GET = route<{ token: string }, 'quotes:customer'>('quotes:customer', async ({ params }) => {
  return NextResponse.json(await getCustomerQuote({ token: params.token }));
});
