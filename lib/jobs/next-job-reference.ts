import 'server-only';
import { sql } from 'drizzle-orm';
import { lockCounter } from '@/db/counter-lock';
import type { Tx } from '@/db';
import { jobs } from '@/db/schema';

/**
 * The next free J-number: one more than the highest "J-<digits>" reference, from J-1001. Counted as
 * `numeric` with BigInt, so a typed-in J-99999999999 neither overflows nor pins the sequence on a
 * number that is already taken (the result is above every existing J-number). Holds the counter's
 * lock until the caller's transaction ends, so insert the job in that same transaction.
 */
export async function nextJobReference(tx: Tx): Promise<string> {
  await lockCounter(tx, 'job-reference');
  const [row] = await tx
    .select({
      top: sql<string | null>`max(substring(${jobs.reference} from '^J-([0-9]{1,30})$')::numeric)::text`,
    })
    .from(jobs);
  const top = row?.top ? BigInt(row.top) : 0n;
  return `J-${(top > 1000n ? top : 1000n) + 1n}`;
}
