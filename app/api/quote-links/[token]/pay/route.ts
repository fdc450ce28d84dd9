// POST /api/quote-links/[token]/pay – public: start a card payment (deposit or in full); answers the payment page url
import { NextResponse } from 'next/server';
import { appOrigin } from '@/lib/api/request-origin';
import { parseJsonBody, route } from '@/lib/api/route';
import { startPayment } from '@/lib/quotes/start-payment';
import { payQuoteBodySchema } from '@/lib/validations/quotes';

export const POST = route<{ token: string }, 'quotes:customer'>(
  'quotes:customer',
  async ({ req, params }) => {
    const { share } = await parseJsonBody(req, payQuoteBodySchema);
    return NextResponse.json(await startPayment({ token: params.token, share, origin: appOrigin(req) }));
  },
);
