// Slows down repeated failed sign-ins for one e-mail address: after a few misses each further
// try must wait, doubling up to a minute. Kept in memory: the yard runs one server process.
const FREE_FAILURES = 3;
const MAX_WAIT_MS = 60_000;
const FORGET_AFTER_MS = 15 * 60_000;

type Entry = { failures: number; lastFailureAt: number };
const entries = new Map<string, Entry>();

const keyOf = (email: string) => email.trim().toLowerCase();

export function waitBeforeNextTry(email: string, now = Date.now()): number {
  const entry = entries.get(keyOf(email));
  if (!entry || now - entry.lastFailureAt > FORGET_AFTER_MS) return 0;
  if (entry.failures < FREE_FAILURES) return 0;
  const wait = Math.min(1000 * 2 ** (entry.failures - FREE_FAILURES), MAX_WAIT_MS);
  return Math.max(0, entry.lastFailureAt + wait - now);
}

export function recordFailedSignIn(email: string, now = Date.now()): void {
  const key = keyOf(email);
  const entry = entries.get(key);
  const fresh = !entry || now - entry.lastFailureAt > FORGET_AFTER_MS;
  entries.set(key, { failures: fresh ? 1 : entry.failures + 1, lastFailureAt: now });
}

export function recordSuccessfulSignIn(email: string): void {
  entries.delete(keyOf(email));
}

export function resetSignInThrottle(): void {
  entries.clear();
}
