import 'server-only';
import nodemailer from 'nodemailer';
import { getDb } from '@/db';
import { sentMail } from '@/db/schema';
import { getEnv } from '@/lib/env';
import { AppError } from '@/lib/errors';

type Attachment = { filename: string; content: Buffer; contentType: string };
type Outgoing = {
  jobId: number | null;
  /** The display name the customer sees: the yard's own name. */
  fromName?: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments: Attachment[];
};

/**
 * Sends one message over SMTP and records it in sent_mail, sent or failed. A failure is a 503
 * with the server's reason; nothing else in the job changes.
 */
export async function sendMail(mail: Outgoing) {
  const env = getEnv();
  const transport = nodemailer.createTransport({
    host: env.KERFWISE_SMTP_HOST,
    port: env.KERFWISE_SMTP_PORT,
    secure: false,
    ignoreTLS: env.NODE_ENV !== 'production',
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 15_000,
  });
  const db = await getDb();
  try {
    const info = await transport.sendMail({
      from: fromHeader(env.KERFWISE_MAIL_FROM, mail.fromName),
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      attachments: mail.attachments,
    });
    await db
      .insert(sentMail)
      .values({ jobId: mail.jobId, to: mail.to, subject: mail.subject, status: 'sent' });
    return { messageId: info.messageId };
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    await db
      .insert(sentMail)
      .values({ jobId: mail.jobId, to: mail.to, subject: mail.subject, status: 'failed', error: reason });
    throw new AppError(
      'unavailable',
      `The e-mail was not sent: the mail server did not take it (${reason}). The job is unchanged; try again later.`,
    );
  } finally {
    transport.close();
  }
}

/** The configured sender address under the yard's name: `"Hollin Lane Timber" <cutting@yard.test>`. */
function fromHeader(configured: string, name?: string): string {
  if (!name) return configured;
  const address = /<([^>]+)>/.exec(configured)?.[1] ?? configured.trim();
  return `"${name.replace(/["\\\r\n]/g, '')}" <${address}>`;
}
