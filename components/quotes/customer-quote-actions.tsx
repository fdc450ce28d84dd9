'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { formatPence } from '@/lib/format/money';
import { fetchJson } from '@/lib/queries/fetch-json';
import type { CustomerQuote } from '@/lib/quotes/get-customer-quote';

/** Accept (typed name, non-returnable tick, on account for trade), then pay a deposit or in full. */
export function CustomerQuoteActions({ token, data }: { token: string; data: CustomerQuote }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(data.payment.lastFailure);
  const { quote, payment } = data;
  const base = `/api/quote-links/${token}`;

  async function accept(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setError(null);
    try {
      await fetchJson(`${base}/accept`, {
        method: 'POST',
        body: JSON.stringify({
          name: String(form.get('name') ?? ''),
          nonReturnable: form.get('nonReturnable') === 'on',
          onAccount: form.get('onAccount') === 'on',
        }),
      });
      router.refresh();
    } catch (err) {
      setError((err as Error).message);
    } finally {
      setBusy(false);
    }
  }

  async function pay(share: 'deposit' | 'full') {
    setBusy(true);
    setError(null);
    try {
      const { url } = await fetchJson<{ url: string }>(`${base}/pay`, {
        method: 'POST',
        body: JSON.stringify({ share }),
      });
      window.location.assign(url);
    } catch (err) {
      setError((err as Error).message);
      setBusy(false);
    }
  }

  if (!quote.acceptedAt) {
    if (data.expired)
      return (
        <Notice tone="warning">This quote has passed its validity date. Ask the yard for a fresh one.</Notice>
      );
    return (
      <form
        onSubmit={accept}
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
  const depositDue = quote.depositPence - payment.paidPence;
  const canPay = payment.state !== 'paid' && payment.state !== 'on_account' && payment.balancePence > 0;
  return (
    <section
      className="space-y-3 rounded-xl border border-sand bg-white p-4 sm:p-6"
      data-testid="pay-section"
    >
      <p>
        Accepted by {quote.acceptedName} on {new Date(quote.acceptedAt).toLocaleString('en-GB')}.
      </p>
      {canPay && (
        <div className="flex flex-col gap-2 sm:flex-row">
          {depositDue > 0 && (
            <Button size="lg" disabled={busy} onClick={() => pay('deposit')}>
              Pay deposit {formatPence(depositDue)}
            </Button>
          )}
          <Button
            size="lg"
            variant={depositDue > 0 ? 'secondary' : 'primary'}
            disabled={busy}
            onClick={() => pay('full')}
          >
            Pay {formatPence(payment.balancePence)} {payment.paidPence > 0 ? 'balance' : 'in full'}
          </Button>
        </div>
      )}
      {error && (
        <Notice tone="error" data-testid="payment-error">
          Last payment attempt: {error}
        </Notice>
      )}
    </section>
  );
}
