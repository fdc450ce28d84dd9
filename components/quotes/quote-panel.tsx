'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { formatPence } from '@/lib/format/money';
import { createQuoteLinkRequest, revokeQuoteLinksRequest, type PlanViewData } from '@/lib/queries/plans';
import { PAYMENT_STATE_LABEL } from '@/lib/quotes/payment-state';
import { QuoteTable } from './quote-table';
import { formatCustomerDate } from '@/lib/format/customer-date';
import { planKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** The plan's quote for the office: figures, acceptance and payment, and the customer's link. */
export function QuotePanel({ plan, canShare }: { plan: PlanViewData; canShare: boolean }) {
  const { quote } = plan;
  const [link, setLink] = useState<{ url: string; expiresAt: string } | null>(null);
  const makeLink = useApiMutation({
    mutationFn: () => createQuoteLinkRequest(plan.id),
    invalidates: [planKeys.detail(plan.id)],
    onSuccess: setLink,
  });
  const withdraw = useApiMutation({
    mutationFn: () => revokeQuoteLinksRequest(plan.id),
    invalidates: [planKeys.detail(plan.id)],
    onSuccess: () => setLink(null),
  });
  // One message at a time: the latest action's.
  const failed = makeLink.error ?? withdraw.error;
  const message = failed
    ? { tone: 'error' as const, text: failed.message }
    : withdraw.data
      ? {
          tone: 'info' as const,
          text: `${withdraw.data.revoked} link${withdraw.data.revoked === 1 ? '' : 's'} withdrawn.`,
        }
      : null;

  return (
    <section className="space-y-3" data-testid="quote-panel">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-xl font-bold">Quote {quote.number}</h2>
        <p className="text-sm text-bark-soft">
          {quote.account === 'trade' ? 'Trade account, prices ex VAT' : 'Retail, prices include VAT'} · valid
          until {formatCustomerDate(quote.validUntil)}
        </p>
      </div>
      <QuoteTable quote={quote} />
      <p data-testid="quote-state" className="font-semibold">
        {PAYMENT_STATE_LABEL[quote.paymentState]}
        {quote.acceptedName ? ` · accepted by ${quote.acceptedName}` : ''}
        {quote.paidPence > 0
          ? ` · paid ${formatPence(quote.paidPence)} of ${formatPence(quote.grossPence)}`
          : ''}
      </p>
      {canShare && (
        <div className="no-print flex flex-wrap gap-2">
          <Button
            variant="secondary"
            onClick={() => {
              withdraw.reset();
              makeLink.mutate();
            }}
          >
            Make a link for the customer
          </Button>
          <Button
            variant="secondary"
            onClick={() => {
              makeLink.reset();
              withdraw.mutate();
            }}
          >
            Withdraw links
          </Button>
        </div>
      )}
      {link && (
        <Notice>
          <p className="break-all">
            Link for the customer (no sign-in needed):{' '}
            <a className="font-semibold underline" href={link.url} data-testid="quote-link">
              {link.url}
            </a>
          </p>
          <p className="text-sm">Expires {formatCustomerDate(link.expiresAt)}.</p>
        </Notice>
      )}
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
    </section>
  );
}
