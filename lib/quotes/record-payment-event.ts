// The payment service's webhook: the signature is checked by the SDK over the raw body, then the
// event is written to the payments ledger once. A replayed event id changes nothing.
import 'server-only';
import { eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { getDb } from '@/db';
import { payments, quotes } from '@/db/schema';
import { getEnv } from '@/lib/env';
import { paymentClient } from '@/lib/payments/payment-client';
import { PAYMENT_KINDS, type PaymentKind } from '@/db/enums';

export class BadSignatureError extends Error {}

export function verifyPaymentEvent(rawBody: string, signature: string | null): Stripe.Event {
  if (!signature) throw new BadSignatureError('The Stripe-Signature header is missing.');
  try {
    return paymentClient().webhooks.constructEvent(
      rawBody,
      signature,
      getEnv().KERFWISE_PAYMENTS_WEBHOOK_SECRET,
    );
  } catch (error) {
    throw new BadSignatureError(error instanceof Error ? error.message : 'The signature does not match.');
  }
}

const kindOf = (value: string | undefined): PaymentKind =>
  PAYMENT_KINDS.includes(value as PaymentKind) ? (value as PaymentKind) : 'full';

export async function recordPaymentEvent(event: Stripe.Event) {
  let metadata: Record<string, string> = {};
  let row: {
    status: 'succeeded' | 'failed';
    amountPence: number;
    checkoutSessionId?: string;
    paymentIntentId?: string;
    note: string;
  };
  if (event.type === 'checkout.session.completed') {
    const session = event.data.object;
    if (session.payment_status !== 'paid') return { recorded: false, reason: 'not paid yet' };
    metadata = session.metadata ?? {};
    const intent =
      typeof session.payment_intent === 'string' ? session.payment_intent : session.payment_intent?.id;
    row = {
      status: 'succeeded',
      amountPence: session.amount_total ?? 0,
      checkoutSessionId: session.id,
      paymentIntentId: intent,
      note: 'Card payment',
    };
  } else if (event.type === 'payment_intent.payment_failed') {
    const intent = event.data.object;
    metadata = intent.metadata ?? {};
    row = {
      status: 'failed',
      amountPence: intent.amount,
      paymentIntentId: intent.id,
      note: intent.last_payment_error?.message ?? 'Card payment failed',
    };
  } else {
    return { recorded: false, reason: `ignored ${event.type}` };
  }
  const quoteId = Number(metadata.quoteId);
  const db = await getDb();
  const [quote] = Number.isSafeInteger(quoteId)
    ? await db.select().from(quotes).where(eq(quotes.id, quoteId))
    : [];
  if (!quote) return { recorded: false, reason: 'no such quote' };
  const inserted = await db
    .insert(payments)
    .values({
      jobId: quote.jobId,
      quoteId: quote.id,
      kind: kindOf(metadata.kind),
      byName: quote.acceptedName ?? '',
      eventId: event.id,
      ...row,
    })
    .onConflictDoNothing({ target: payments.eventId })
    .returning({ id: payments.id });
  return inserted.length ? { recorded: true } : { recorded: false, reason: 'already recorded' };
}
