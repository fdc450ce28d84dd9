// Tags for offcuts made at the saw: K- and a zero-padded number, the next one not yet used.
import { sql } from 'drizzle-orm';
import { lockCounter } from '@/db/counter-lock';
import type { Tx } from '@/db';
import { offcuts } from '@/db/schema';

export const SAW_TAG_PREFIX = 'K-';

/** Holds the counter's lock until the caller's transaction ends, so insert the offcut in it. */
export async function nextOffcutTag(tx: Tx): Promise<string> {
  await lockCounter(tx, 'offcut-tag');
  const [row] = await tx
    .select({ top: sql<number | null>`max(cast(substring(${offcuts.tag} from 3) as integer))` })
    .from(offcuts)
    .where(sql`${offcuts.tag} ~ '^K-[0-9]+$'`);
  return `${SAW_TAG_PREFIX}${String((row?.top ?? 0) + 1).padStart(4, '0')}`;
}
