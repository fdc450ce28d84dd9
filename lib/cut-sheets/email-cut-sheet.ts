import 'server-only';
import { AppError } from '@/lib/errors';
import { sendMail } from '@/lib/mail/send-mail';
import { renderCutSheet } from './render-cut-sheet';

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const pounds = (n: number) => `£${n.toFixed(2)}`;

/** E-mails a plan's cut sheet (PDF attached) and its quote to the customer. */
export async function emailCutSheet({
  planId,
  to,
  message,
}: {
  planId: number;
  to?: string;
  message?: string;
}) {
  const { pdf, plan, job, yard, fileName } = await renderCutSheet({ planId });
  const address = to || job.customerEmail;
  if (!address)
    throw new AppError(
      'invalid',
      `Job ${job.reference} has no customer e-mail; enter an address to send to.`,
    );
  const subject = `Cut sheet and quote for ${job.reference} from ${yard.yardName}`;
  const quote = plan.price
    ? [
        ...plan.price.lines.map(
          (l) => `${l.description}: ${l.quantity} × ${pounds(l.unitPrice)} = ${pounds(l.amount)}`,
        ),
        `Total: ${pounds(plan.price.total)}`,
      ]
    : [];
  const lines = [
    `Hello ${job.customerName},`,
    '',
    ...(message ? [message, ''] : []),
    `Your cut sheet for job ${job.reference} is attached (${plan.totals.boards} boards, ${plan.totals.cuts} cuts).`,
    '',
    'Quote',
    ...quote,
    '',
    yard.yardName,
  ];
  await sendMail({
    jobId: job.id,
    to: address,
    subject,
    text: lines.join('\n'),
    html: lines.map((l) => (l ? `<p>${escapeHtml(l)}</p>` : '')).join(''),
    attachments: [{ filename: fileName, content: pdf, contentType: 'application/pdf' }],
  });
  return { sent: true, to: address, subject };
}
