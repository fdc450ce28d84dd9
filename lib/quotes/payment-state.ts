// Where a job stands between quote and saw, from its quote and the payments ledger.
import type { Payment, Quote } from '@/db/schema';

export type PaymentState = 'not_accepted' | 'unpaid' | 'deposit_paid' | 'paid' | 'on_account';

export function paidPence(payments: Pick<Payment, 'status' | 'amountPence'>[]): number {
  return payments.filter((p) => p.status === 'succeeded').reduce((sum, p) => sum + p.amountPence, 0);
}

// The payment service takes no card payment under 30p in sterling (Stripe documentation, "Supported
// currencies", minimum charge amounts: GBP 0.30); the local fake refuses the same.
export const CARD_MINIMUM_PENCE = 30;

type QuoteMoney = Pick<Quote, 'depositPence' | 'grossPence'>;

/**
 * What the customer still has to pay by card before release, or 0. A deposit under the card minimum is
 * taken at the minimum (never above the total). A shortfall under the minimum once something is paid (a
 * re-plan that moved the price up by pennies) cannot be charged on its own, so it joins the balance.
 */
export function depositDuePence(quote: QuoteMoney, paid: number): number {
  const due = quote.depositPence - paid;
  if (due <= 0 || (paid > 0 && due < CARD_MINIMUM_PENCE)) return 0;
  return Math.min(Math.max(due, CARD_MINIMUM_PENCE), quote.grossPence - paid);
}

export function paymentState(
  quote: Pick<Quote, 'acceptedAt' | 'onAccount' | 'depositPence' | 'grossPence'>,
  paid: number,
): PaymentState {
  if (!quote.acceptedAt) return 'not_accepted';
  if (paid >= quote.grossPence) return 'paid';
  if (quote.onAccount) return 'on_account';
  if (paid > 0 && depositDuePence(quote, paid) === 0) return 'deposit_paid';
  return 'unpaid';
}

export const PAYMENT_STATE_LABEL: Record<PaymentState, string> = {
  not_accepted: 'Awaiting acceptance',
  unpaid: 'Accepted, not paid',
  deposit_paid: 'Deposit paid',
  paid: 'Paid',
  on_account: 'On account',
};

/** What release still needs, or null when the plan may go to the saw. */
export function missingForRelease(state: PaymentState): string | null {
  if (state === 'not_accepted') return 'the customer has not accepted the quote yet, and nothing is paid';
  if (state === 'unpaid') return 'the customer accepted the quote but has not paid the deposit';
  return null;
}
