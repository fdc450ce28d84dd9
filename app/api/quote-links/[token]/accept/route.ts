// POST /api/quote-links/[token]/accept – public: the customer accepts the quote (name, non-returnable tick)
import { NextResponse } from 'next/server';
import { clientIp } from '@/lib/api/request-origin';
import { parseJsonBody, route } from '@/lib/api/route';
import { acceptQuote } from '@/lib/quotes/accept-quote';
import { acceptQuoteBodySchema } from '@/lib/validations/quotes';

export const POST = route<{ token: string }, 'quotes:customer'>(
  'quotes:customer',
  async ({ req, params }) => {
    const body = await parseJsonBody(req, acceptQuoteBodySchema);
    return NextResponse.json(
      await acceptQuote({
        token: params.token,
        name: body.name,
        onAccount: body.onAccount,
        ip: clientIp(req),
      }),
    );
  },
);
