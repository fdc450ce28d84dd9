// Issues offcut tags inside the caller's transaction: the counter lock is held until it ends, so
// insert the offcuts in the same transaction and no other instance can issue the same tags.
import { sql } from 'drizzle-orm';
import { lockCounter } from '@/db/counter-lock';
import type { Tx } from '@/db';
import { offcuts } from '@/db/schema';
import { nextOffcutTags } from './offcut-tag';

/** `count` new tags, skipping every tag on the rack and any in `alsoTaken` (e.g. a file's own codes). */
export async function issueOffcutTags(tx: Tx, count: number, alsoTaken: string[] = []): Promise<string[]> {
  if (count === 0) return [];
  await lockCounter(tx, 'offcut-tag');
  // Only tags in the issued format matter for the next number; a yard's own codes are compared too.
  const rows = await tx
    .select({ tag: offcuts.tag })
    .from(offcuts)
    .where(sql`${offcuts.tag} ~* '^K-[0-9]+$'`);
  return nextOffcutTags(count, [...rows.map((r) => r.tag), ...alsoTaken]);
}

export async function issueOffcutTag(tx: Tx): Promise<string> {
  const [tag] = await issueOffcutTags(tx, 1);
  return tag;
}
