// Session tokens carry the user's session version; bumping the version in the database ends every
// session issued before (sign-out, password change, role change, disabling).
import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { users } from '@/db/schema';

export async function bumpSessionVersion(tx: DbOrTx, userId: number): Promise<void> {
  await tx
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
}

/** True while the token's version is the user's current one and the account is active. */
export async function isSessionCurrent(userId: number, sessionVersion: unknown): Promise<boolean> {
  if (!Number.isSafeInteger(userId) || userId <= 0 || typeof sessionVersion !== 'number') return false;
  const db = await getDb();
  const [user] = await db
    .select({ sessionVersion: users.sessionVersion, disabled: users.disabled })
    .from(users)
    .where(eq(users.id, userId));
  return !!user && !user.disabled && user.sessionVersion === sessionVersion;
}
