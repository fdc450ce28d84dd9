// Starts a card payment for an accepted quote: a Checkout Session at the payment service, whose page
// the customer is sent to. The payment is recorded only when the signed webhook says it succeeded.
import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { payments } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { paymentClient } from '@/lib/payments/payment-client';
import { formatPence } from '@/lib/format/money';
import { CARD_MINIMUM_PENCE, depositDuePence, paidPence } from './payment-state';
import { resolveQuoteToken } from './quote-links';

export async function startPayment({
  token,
  share,
  origin,
}: {
  token: string;
  share: 'deposit' | 'full';
  origin: string;
}) {
  const quote = await resolveQuoteToken(token);
  if (!quote.acceptedAt) throw new AppError('conflict', 'Accept the quote first, then pay.');
  const db = await getDb();
  const paid = paidPence(await db.select().from(payments).where(eq(payments.jobId, quote.jobId)));
  const amount = share === 'deposit' ? depositDuePence(quote, paid) : quote.grossPence - paid;
  if (amount <= 0)
    throw new AppError(
      'conflict',
      share === 'deposit' ? 'The deposit is already paid.' : 'This quote is paid in full.',
    );
  if (amount < CARD_MINIMUM_PENCE)
    throw new AppError(
      'conflict',
      `${formatPence(amount)} is left to pay, less than the smallest card payment ` +
        `(${formatPence(CARD_MINIMUM_PENCE)}): settle it with the yard when you collect.`,
    );
  const kind = share === 'full' ? (paid > 0 ? 'balance' : 'full') : 'deposit';
  const metadata = { quoteId: String(quote.id), jobId: String(quote.jobId), kind };
  const label = { deposit: 'Deposit', full: 'Payment in full', balance: 'Balance' }[kind];
  try {
    const session = await paymentClient().checkout.sessions.create({
      mode: 'payment',
      client_reference_id: quote.number,
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: 'gbp',
            unit_amount: amount,
            product_data: { name: `${label} for quote ${quote.number}` },
          },
        },
      ],
      metadata,
      payment_intent_data: { metadata },
      success_url: `${origin}/q/${token}?payment=done`,
      cancel_url: `${origin}/q/${token}?payment=cancelled`,
    });
    if (!session.url) throw new Error('no payment page address came back');
    return { url: session.url, amountPence: amount };
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new AppError(
      'unavailable',
      `The payment service did not answer (${reason}). Nothing was charged; try again shortly.`,
    );
  }
}
