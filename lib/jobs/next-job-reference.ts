import 'server-only';
import { sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { jobs } from '@/db/schema';

/** The next free J-number: one more than the highest "J-<digits>" reference, from J-1001. */
export async function nextJobReference(db: DbOrTx): Promise<string> {
  const [row] = await db
    .select({ top: sql<number | null>`max(substring(${jobs.reference} from '^J-([0-9]{1,9})$')::int)` })
    .from(jobs);
  return `J-${Math.max(1000, row?.top ?? 0) + 1}`;
}
