import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { users, type Role } from '@/db/schema';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import {
  recordFailedSignIn,
  recordSuccessfulSignIn,
  waitBeforeNextTry,
  type SignInAttempt,
} from '@/lib/auth/sign-in-throttle';

export type SignedInUser = { id: string; email: string; name: string; role: Role; sessionVersion: number };

export const WRONG_CREDENTIALS = 'That e-mail and password do not match an active account.';

// An unknown or disabled account is checked against this hash, so every answer costs one argon2
// verification and timing does not tell which e-mail addresses have accounts.
let dummyHash: Promise<string> | undefined;
const getDummyHash = () => (dummyHash ??= hashPassword('no account has this password'));

/** Checks an e-mail and password; throws an Error whose message the sign-in page shows. */
export async function verifyCredentials({
  email,
  password,
  clientAddress,
}: {
  email: string;
  password: string;
  clientAddress: string;
}): Promise<SignedInUser> {
  const db = await getDb();
  const attempt: SignInAttempt = { email, clientAddress };
  const wait = await waitBeforeNextTry(db, attempt);
  if (wait > 0) {
    throw new Error(`Too many failed tries. Wait ${Math.ceil(wait / 1000)} s and try again.`);
  }
  const [user] = await db.select().from(users).where(eq(users.email, email.trim().toLowerCase()));
  const active = user && !user.disabled;
  const matches = await verifyPassword(active ? user.passwordHash : await getDummyHash(), password);
  if (!active || !matches) {
    await recordFailedSignIn(db, attempt);
    throw new Error(WRONG_CREDENTIALS);
  }
  await recordSuccessfulSignIn(db, attempt);
  return {
    id: String(user.id),
    email: user.email,
    name: user.name,
    role: user.role,
    sessionVersion: user.sessionVersion,
  };
}
