import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, sentMail } from '@/db/schema';
import { getEnv } from '@/lib/env';
import type { CaughtMail } from './mail-catcher';

/** Every send the product recorded, newest first, with the job it was about. */
export async function listSentMail({ limit = 200 }: { limit?: number } = {}) {
  const db = await getDb();
  return db
    .select({
      id: sentMail.id,
      to: sentMail.to,
      subject: sentMail.subject,
      status: sentMail.status,
      error: sentMail.error,
      createdAt: sentMail.createdAt,
      jobId: sentMail.jobId,
      jobReference: jobs.reference,
    })
    .from(sentMail)
    .leftJoin(jobs, eq(jobs.id, sentMail.jobId))
    .orderBy(desc(sentMail.id))
    .limit(limit);
}

/** In development, what the local mail catcher received; null when no catcher is configured or it does not answer. */
export async function listCaughtMail(): Promise<CaughtMail[] | null> {
  const url = getEnv().KERFWISE_MAIL_CATCHER_URL;
  if (!url) return null;
  try {
    const response = await fetch(`${url}/messages`, {
      signal: AbortSignal.timeout(2_000),
      cache: 'no-store',
    });
    const body = (await response.json()) as { messages: CaughtMail[] };
    return [...body.messages].reverse();
  } catch {
    return null;
  }
}
