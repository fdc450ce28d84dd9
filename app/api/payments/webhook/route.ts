// POST /api/payments/webhook – public but signed: the payment service's events. 400 for a missing or
// wrong signature (nothing recorded); a replayed event is answered 200 and changes nothing.
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { BadSignatureError, recordPaymentEvent, verifyPaymentEvent } from '@/lib/quotes/record-payment-event';

export const POST = route<Record<string, never>, 'payments:webhook'>('payments:webhook', async ({ req }) => {
  const rawBody = await req.text();
  let event;
  try {
    event = verifyPaymentEvent(rawBody, req.headers.get('stripe-signature'));
  } catch (error) {
    if (error instanceof BadSignatureError) {
      return NextResponse.json(
        { error: `Webhook signature check failed: ${error.message}` },
        { status: 400 },
      );
    }
    throw error;
  }
  return NextResponse.json({ received: true, ...(await recordPaymentEvent(event)) });
});
