'use client';

import { useRouter } from 'next/navigation';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { formatCustomerDate } from '@/lib/format/customer-date';
import { formatPence } from '@/lib/format/money';
import { acceptQuoteRequest, payQuoteRequest } from '@/lib/queries/quotes';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { CustomerQuote } from '@/lib/quotes/get-customer-quote';
import { CARD_MINIMUM_PENCE } from '@/lib/quotes/payment-state';

/** Accept (typed name, non-returnable tick, on account for trade), then pay a deposit or in full. */
export function CustomerQuoteActions({ token, data }: { token: string; data: CustomerQuote }) {
  const router = useRouter();
  const { quote, payment } = data;
  const accept = useApiMutation({
    mutationFn: (form: FormData) =>
      acceptQuoteRequest(token, {
        name: String(form.get('name') ?? ''),
        // An unticked box is sent as it is: the server answers with its own message.
        nonReturnable: (form.get('nonReturnable') === 'on') as true,
        onAccount: form.get('onAccount') === 'on',
      }),
    onSuccess: () => router.refresh(),
  });
  const pay = useApiMutation({
    mutationFn: (share: 'deposit' | 'full') => payQuoteRequest(token, { share }),
    onSuccess: ({ url }) => window.location.assign(url),
  });
  // Busy too once the payment page is opening.
  const busy = accept.isPending || pay.isPending || pay.isSuccess;
  // The last failed card payment shows until the customer tries again.
  const error =
    accept.error?.message ??
    pay.error?.message ??
    (accept.isIdle && pay.isIdle ? data.payment.lastFailure : null);

  function submitAcceptance(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    accept.mutate(new FormData(e.currentTarget));
  }

  if (!quote.acceptedAt) {
    if (data.expired)
      return (
        <Notice tone="warning">This quote has passed its validity date. Ask the yard for a fresh one.</Notice>
      );
    return (
      <form
        onSubmit={submitAcceptance}
        className="space-y-3 rounded-xl border border-sand bg-white p-4 sm:p-6"
        data-testid="accept-form"
      >
        <h2 className="text-xl font-bold">Accept this quote</h2>
        <label className="block font-semibold">
          Your name
          <input
            name="name"
            required
            minLength={2}
            autoComplete="name"
            className="mt-1 block w-full rounded border border-bark-soft px-3 py-2 font-normal"
          />
        </label>
        <label className="flex items-start gap-2">
          <input type="checkbox" name="nonReturnable" required className="mt-1 size-5" />
          <span>I understand that timber cut to my lengths cannot be returned.</span>
        </label>
        {data.canPayOnAccount && (
          <label className="flex items-start gap-2">
            <input type="checkbox" name="onAccount" className="mt-1 size-5" />
            <span>Charge it to our trade account instead of paying now.</span>
          </label>
        )}
        <Button type="submit" size="lg" disabled={busy}>
          Accept quote
        </Button>
        {error && <Notice tone="error">{error}</Notice>}
      </form>
    );
  }
  const depositDue = payment.depositDuePence;
  const open = payment.state !== 'paid' && payment.state !== 'on_account' && payment.balancePence > 0;
  // Pennies left over (a re-plan after the deposit) are below the smallest card payment.
  const canPay = open && payment.balancePence >= CARD_MINIMUM_PENCE;
  return (
    <section
      className="space-y-3 rounded-xl border border-sand bg-white p-4 sm:p-6"
      data-testid="pay-section"
    >
      <p>
        Accepted by {quote.acceptedName} on {formatCustomerDate(quote.acceptedAt)}.
      </p>
      {canPay && (
        <div className="flex flex-col gap-2 sm:flex-row">
          {depositDue > 0 && (
            <Button size="lg" disabled={busy} onClick={() => pay.mutate('deposit')}>
              Pay deposit {formatPence(depositDue)}
            </Button>
          )}
          <Button
            size="lg"
            variant={depositDue > 0 ? 'secondary' : 'primary'}
            disabled={busy}
            onClick={() => pay.mutate('full')}
          >
            Pay {formatPence(payment.balancePence)} {payment.paidPence > 0 ? 'balance' : 'in full'}
          </Button>
        </div>
      )}
      {open && !canPay && (
        <p data-testid="pay-at-collection">
          {formatPence(payment.balancePence)} is left to pay, less than the smallest card payment: settle it
          with the yard when you collect.
        </p>
      )}
      {error && (
        <Notice tone="error" data-testid="payment-error">
          Last payment attempt: {error}
        </Notice>
      )}
    </section>
  );
}
