import 'server-only';
import { sql } from 'drizzle-orm';
import { lockCounter } from '@/db/counter-lock';
import type { Tx } from '@/db';
import { jobs } from '@/db/schema';

/**
 * The next free J-number: one more than the highest "J-<digits>" reference, from J-1001. Holds the
 * counter's lock until the caller's transaction ends, so insert the job in that same transaction.
 */
export async function nextJobReference(tx: Tx): Promise<string> {
  await lockCounter(tx, 'job-reference');
  const [row] = await tx
    .select({ top: sql<number | null>`max(substring(${jobs.reference} from '^J-([0-9]{1,9})$')::int)` })
    .from(jobs);
  return `J-${Math.max(1000, row?.top ?? 0) + 1}`;
}
