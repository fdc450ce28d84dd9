// Numbers such as job references and offcut tags are "one more than the highest in use". Two app
// instances reading that maximum at once would hand out the same number, so each allocation first
// takes a transaction-scoped advisory lock named after the counter: the second caller waits until
// the first one's transaction commits and then sees its number. Works the same on embedded PGlite.
import { sql } from 'drizzle-orm';
import type { Tx } from './types';

export type CounterName = 'job-reference' | 'offcut-tag' | 'quote-number';

export async function lockCounter(tx: Tx, name: CounterName): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`kerfwise:${name}`}))`);
}
