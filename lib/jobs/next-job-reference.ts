import 'server-only';
import { sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { jobs } from '@/db/schema';

/**
 * The next free J-number: one more than the highest "J-<digits>" reference, from J-1001. Counted as
 * `numeric` with BigInt, so a typed-in J-99999999999 neither overflows nor pins the sequence on a
 * number that is already taken (the result is above every existing J-number).
 */
export async function nextJobReference(db: DbOrTx): Promise<string> {
  const [row] = await db
    .select({
      top: sql<string | null>`max(substring(${jobs.reference} from '^J-([0-9]{1,30})$')::numeric)::text`,
    })
    .from(jobs);
  const top = row?.top ? BigInt(row.top) : 0n;
  return `J-${(top > 1000n ? top : 1000n) + 1n}`;
}
