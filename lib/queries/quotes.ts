import type { acceptQuote } from '@/lib/quotes/accept-quote';
import type { refundJob } from '@/lib/quotes/refund-job';
import type { startPayment } from '@/lib/quotes/start-payment';
import type { AcceptQuoteBodyInput, PayQuoteBodyInput, RefundJobBodyInput } from '@/lib/validations/quotes';
import { fetchJson } from './fetch-json';
import type { WireOf } from './wire';

/** The customer's link: accept the quote (public, by token). */
export const acceptQuoteRequest = (token: string, body: AcceptQuoteBodyInput) =>
  fetchJson<WireOf<typeof acceptQuote>>(`/api/quote-links/${token}/accept`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

/** The customer's link: start a card payment; the answer names the payment page. */
export const payQuoteRequest = (token: string, body: PayQuoteBodyInput) =>
  fetchJson<WireOf<typeof startPayment>>(`/api/quote-links/${token}/pay`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

/** The owner refunds what a cancelled job paid. */
export const refundJobRequest = (jobId: number, body: RefundJobBodyInput) =>
  fetchJson<WireOf<typeof refundJob>>(`/api/jobs/${jobId}/refund`, {
    method: 'POST',
    body: JSON.stringify(body),
  });
