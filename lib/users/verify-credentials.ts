import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { users, type Role } from '@/db/schema';
import { verifyPassword } from '@/lib/auth/password';
import { recordFailedSignIn, recordSuccessfulSignIn, waitBeforeNextTry } from '@/lib/auth/sign-in-throttle';

export type SignedInUser = { id: string; email: string; name: string; role: Role };

export const WRONG_CREDENTIALS = 'That e-mail and password do not match an active account.';

/** Checks an e-mail and password; throws an Error whose message the sign-in page shows. */
export async function verifyCredentials({
  email,
  password,
}: {
  email: string;
  password: string;
}): Promise<SignedInUser> {
  const wait = waitBeforeNextTry(email);
  if (wait > 0) {
    throw new Error(`Too many failed tries. Wait ${Math.ceil(wait / 1000)} s and try again.`);
  }
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.email, email.trim().toLowerCase()));
  const ok = user && !user.disabled && (await verifyPassword(user.passwordHash, password));
  if (!ok) {
    recordFailedSignIn(email);
    throw new Error(WRONG_CREDENTIALS);
  }
  recordSuccessfulSignIn(email);
  return { id: String(user.id), email: user.email, name: user.name, role: user.role };
}
