// The one guard every route handler, server action and protected page calls.
// The role is read from the database on each call, so a changed role or a disabled account
// takes effect at once rather than when the session token expires.
import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { users, type Role } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { userCan, type Action } from './permissions';
import { readSessionUserId } from './read-session';

export type CurrentUser = { id: number; email: string; name: string; role: Role; canUseSaw: boolean };

export async function getCurrentUser(): Promise<CurrentUser | null> {
  const id = await readSessionUserId();
  if (id === null) return null;
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.id, id));
  if (!user || user.disabled) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role, canUseSaw: user.canUseSaw };
}

/** 401 without a session, 403 when the role may not perform the action. */
export async function requireUser(action: Action): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError('unauthenticated', 'Sign in to continue.');
  if (!userCan(user, action)) {
    throw new AppError('forbidden', 'Your role does not allow this.');
  }
  return user;
}
