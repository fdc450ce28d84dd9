import 'server-only';
import { AppError } from '@/lib/errors';
import { formatPence } from '@/lib/format/money';
import { sendMail } from '@/lib/mail/send-mail';
import { createQuoteLink } from '@/lib/quotes/quote-links';
import { renderCutSheet } from './render-cut-sheet';

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
// A yard hand who writes their own greeting should not get a second one above it.
const OPENS_WITH_GREETING =
  /^\s*(hi|hello|hiya|hey|dear|morning|afternoon|evening|good (morning|afternoon|evening))\b/i;

/** E-mails the customer's copy of a plan's cut sheet (PDF), its quote and a link to accept and pay. */
export async function emailCutSheet({
  planId,
  to,
  message,
  userId,
  origin,
}: {
  planId: number;
  to?: string;
  message?: string;
  userId: number;
  origin: string;
}) {
  const { pdf, plan, job, yard, quote, fileName } = await renderCutSheet({ planId, forCustomer: true });
  const address = to || job.customerEmail;
  if (!address)
    throw new AppError(
      'invalid',
      `Job ${job.reference} has no customer e-mail; enter an address to send to.`,
    );
  const link = await createQuoteLink({ planId, userId, origin });
  const subject = `Quote ${quote.number} and cut sheet from ${yard.yardName}`;
  const retail = quote.account === 'retail';
  const note = message?.trim() ?? '';
  const lines = [
    ...(OPENS_WITH_GREETING.test(note) ? [] : [`Hello ${job.customerName},`, '']),
    ...(note ? [note, ''] : []),
    `Here is our quote ${quote.number} for job ${job.reference} (${plan.totals.boards} boards, ${plan.totals.cuts} cuts), with the cut sheet attached.`,
    '',
    ...quote.lines.map(
      (l) =>
        `${l.description}: ${formatPence(retail ? (l.grossAmountPence ?? l.amountPence) : l.amountPence)}`,
    ),
    ...(retail
      ? [`Total to pay: ${formatPence(quote.grossPence)} (includes VAT of ${formatPence(quote.vatPence)})`]
      : [
          `Total before VAT: ${formatPence(quote.netPence)}`,
          `VAT at ${quote.vatRatePercent} %: ${formatPence(quote.vatPence)}`,
          `Total to pay: ${formatPence(quote.grossPence)}`,
        ]),
    `Valid until ${quote.validUntil.slice(0, 10)}.`,
    '',
    `To accept the quote and pay, open: ${link.url}`,
    'Cut timber cannot be returned, so we start cutting once the quote is accepted and paid.',
    '',
    yard.yardName,
    ...(yard.yardAddress ? [yard.yardAddress] : []),
    ...(yard.vatNumber ? [`VAT number ${yard.vatNumber}`] : []),
  ];
  await sendMail({
    jobId: job.id,
    fromName: yard.yardName,
    to: address,
    subject,
    text: lines.join('\n'),
    html: lines
      .map((l) =>
        l === `To accept the quote and pay, open: ${link.url}`
          ? `<p>To accept the quote and pay, open <a href="${escapeHtml(link.url)}">your quote page</a>.</p>`
          : l
            ? `<p>${escapeHtml(l)}</p>`
            : '',
      )
      .join(''),
    attachments: [{ filename: fileName, content: pdf, contentType: 'application/pdf' }],
  });
  return { sent: true, to: address, subject, quoteUrl: link.url, expiresAt: link.expiresAt };
}
