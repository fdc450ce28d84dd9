// Slows down repeated failed sign-ins, per e-mail address and per client address: after a few
// misses each further try must wait, doubling up to a cap. Counts live in the database, so a
// restart does not reset them.
import { eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { signInFailures } from '@/db/schema';

type Rule = { freeFailures: number; maxWaitMs: number };
/** One address may be a whole yard office behind one router: it gets more free tries. */
const RULES = {
  email: { freeFailures: 3, maxWaitMs: 60_000 },
  ip: { freeFailures: 10, maxWaitMs: 5 * 60_000 },
} satisfies Record<string, Rule>;
const FORGET_AFTER_MS = 15 * 60_000;

export type SignInAttempt = { email: string; clientAddress: string };

const keysOf = ({ email, clientAddress }: SignInAttempt) => ({
  email: `email:${email.trim().toLowerCase()}`,
  ip: `ip:${clientAddress}`,
});

/** How long one counter says to wait (pure, for tests and the database version alike). */
export function waitFor(
  entry: { failures: number; lastFailureAt: Date } | undefined,
  rule: Rule,
  now: number,
): number {
  if (!entry || now - entry.lastFailureAt.getTime() > FORGET_AFTER_MS) return 0;
  if (entry.failures < rule.freeFailures) return 0;
  const wait = Math.min(1000 * 2 ** Math.min(entry.failures - rule.freeFailures, 30), rule.maxWaitMs);
  return Math.max(0, entry.lastFailureAt.getTime() + wait - now);
}

export async function waitBeforeNextTry(
  db: DbOrTx,
  attempt: SignInAttempt,
  now = Date.now(),
): Promise<number> {
  const keys = keysOf(attempt);
  const rows = await db
    .select()
    .from(signInFailures)
    .where(inArray(signInFailures.key, [keys.email, keys.ip]));
  const byKey = new Map(rows.map((r) => [r.key, r]));
  return Math.max(
    waitFor(byKey.get(keys.email), RULES.email, now),
    waitFor(byKey.get(keys.ip), RULES.ip, now),
  );
}

export async function recordFailedSignIn(
  db: DbOrTx,
  attempt: SignInAttempt,
  now = Date.now(),
): Promise<void> {
  const at = new Date(now);
  const stale = new Date(now - FORGET_AFTER_MS);
  for (const key of Object.values(keysOf(attempt))) {
    await db
      .insert(signInFailures)
      .values({ key, failures: 1, lastFailureAt: at })
      .onConflictDoUpdate({
        target: signInFailures.key,
        set: {
          failures: sql`case when ${signInFailures.lastFailureAt} < ${stale} then 1 else ${signInFailures.failures} + 1 end`,
          lastFailureAt: at,
        },
      });
  }
}

export async function recordSuccessfulSignIn(db: DbOrTx, attempt: SignInAttempt): Promise<void> {
  await db.delete(signInFailures).where(eq(signInFailures.key, keysOf(attempt).email));
}
