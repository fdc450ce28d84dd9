// What the customer sees: the yard, the quote, the pieces, and the accept and pay steps.
import { formatPence } from '@/lib/format/money';
import type { CustomerQuote } from '@/lib/quotes/get-customer-quote';
import { PAYMENT_STATE_LABEL } from '@/lib/quotes/payment-state';
import { CustomerQuoteActions } from './customer-quote-actions';
import { QuoteTable } from './quote-table';
import { formatCustomerDate } from '@/lib/format/customer-date';

export function CustomerQuoteView({
  token,
  data,
  returned,
}: {
  token: string;
  data: CustomerQuote;
  returned?: string;
}) {
  const { quote, yard, job, payment } = data;
  return (
    <div className="space-y-6">
      <header className="space-y-1 border-b-4 border-spruce pb-4">
        <p className="text-lg font-bold text-spruce-dark">{yard.name}</p>
        {yard.address && <p className="text-sm text-bark-soft">{yard.address}</p>}
        {yard.vatNumber && <p className="text-sm text-bark-soft">VAT number {yard.vatNumber}</p>}
        <h1 className="pt-3 text-2xl font-bold tracking-tight sm:text-3xl">
          Quote {quote.number} for {job.customerName}
        </h1>
        <p className="text-bark-soft">
          Job {job.reference} · valid until {formatCustomerDate(quote.validUntil)}
          {data.expired && !quote.acceptedAt ? ' (expired)' : ''}
        </p>
      </header>
      {returned === 'done' && (
        <p
          className="rounded-lg border-l-4 border-spruce bg-spruce-light px-4 py-3"
          role="status"
          data-testid="payment-returned"
        >
          Thank you.{' '}
          {payment.paidPence > 0
            ? `We have received ${formatPence(payment.paidPence)}.`
            : 'Your payment is being confirmed; refresh in a moment.'}
        </p>
      )}
      <section className="rounded-xl border border-sand bg-white p-4 shadow-sm sm:p-6">
        <QuoteTable quote={quote} />
        <p className="mt-3 font-semibold" data-testid="customer-payment-state">
          {PAYMENT_STATE_LABEL[payment.state]}
          {payment.paidPence > 0
            ? ` · paid ${formatPence(payment.paidPence)}, ${formatPence(Math.max(payment.balancePence, 0))} to pay`
            : ''}
        </p>
      </section>
      <CustomerQuoteActions token={token} data={data} />
      <section className="space-y-2">
        <h2 className="text-xl font-bold">Your pieces</h2>
        {data.items.some((item) => item.toleranceMm > 0) && (
          <p className="text-sm text-bark-soft">
            A nominal piece is sold by its length but may be cut a few millimetres short, so that a whole
            stock length or fewer boards can be used; an exact piece is supplied to the millimetre.
          </p>
        )}
        <ul
          className="divide-y divide-sand rounded-xl border border-sand bg-white"
          data-testid="customer-pieces"
        >
          {data.items.map((item, i) => (
            <li key={i} className="flex justify-between gap-3 px-4 py-2">
              <span>
                {item.section}
                {item.label ? ` · ${item.label}` : ''}
              </span>
              <span className="text-right">
                <span className="font-mono whitespace-nowrap">
                  {item.lengthMm} mm × {item.quantity}
                </span>
                <span className="block text-sm text-bark-soft" data-testid="piece-length-kind">
                  {item.toleranceMm > 0
                    ? `nominal: may be up to ${item.toleranceMm} mm short`
                    : 'exact length'}
                </span>
              </span>
            </li>
          ))}
        </ul>
        <p>
          <a className="font-semibold text-spruce underline" href={data.cutSheetUrl}>
            Cut sheet (PDF)
          </a>
        </p>
      </section>
      <p className="text-sm text-bark-soft">
        Cut timber cannot be returned, so the yard cuts once the quote is accepted and paid. Working with
        treated timber: wear a dust mask and gloves when cutting, wash before eating, and never burn offcuts.
        Sizes and spans are for local building rules or an engineer.
      </p>
    </div>
  );
}
