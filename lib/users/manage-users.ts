import 'server-only';
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { users } from '@/db/schema';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { bumpSessionVersion } from '@/lib/auth/session-version';
import { AppError, notFound } from '@/lib/errors';
import type { ChangeOwnPasswordBody, CreateUserBody, UpdateUserBody } from '@/lib/validations/users';

const publicColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  disabled: users.disabled,
  canUseSaw: users.canUseSaw,
  createdAt: users.createdAt,
};
export type UserSummary = Awaited<ReturnType<typeof listUsers>>[number];

export async function listUsers() {
  const db = await getDb();
  return db.select(publicColumns).from(users).orderBy(asc(users.name));
}

export async function createUser(body: CreateUserBody) {
  const db = await getDb();
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, body.email));
  if (existing) throw new AppError('conflict', `There is already an account for ${body.email}.`);
  const passwordHash = await hashPassword(body.password);
  const [user] = await db
    .insert(users)
    .values({ email: body.email, name: body.name, role: body.role, passwordHash })
    .returning(publicColumns);
  return user;
}

async function otherActiveOwners(tx: DbOrTx, userId: number): Promise<number> {
  const [{ n }] = await tx
    .select({ n: sql<number>`count(*)::int` })
    .from(users)
    .where(and(eq(users.role, 'owner'), eq(users.disabled, false), ne(users.id, userId)));
  return n;
}

/** Changes a user; refuses to demote or disable the last active owner. */
export async function updateUser({ userId, changes }: { userId: number; changes: UpdateUserBody }) {
  const db = await getDb();
  const passwordHash = changes.password ? await hashPassword(changes.password) : undefined;
  return db.transaction(async (tx) => {
    const [user] = await tx.select().from(users).where(eq(users.id, userId)).for('update');
    if (!user) throw notFound('That user');
    const losesOwner =
      user.role === 'owner' &&
      !user.disabled &&
      ((changes.role && changes.role !== 'owner') || changes.disabled);
    if (losesOwner && (await otherActiveOwners(tx, userId)) === 0) {
      throw new AppError(
        'conflict',
        'The yard needs at least one active owner: make someone else owner first.',
      );
    }
    const [updated] = await tx
      .update(users)
      .set({
        name: changes.name,
        role: changes.role,
        disabled: changes.disabled,
        canUseSaw: changes.canUseSaw,
        passwordHash,
      })
      .where(eq(users.id, userId))
      .returning(publicColumns);
    // A new role, password or access ends the person's open sessions: they sign in again.
    const revokes =
      passwordHash !== undefined ||
      (changes.role !== undefined && changes.role !== user.role) ||
      changes.disabled === true ||
      (changes.canUseSaw === false && user.canUseSaw);
    if (revokes) await bumpSessionVersion(tx, userId);
    return updated;
  });
}

/** Anyone signed in changes their own password; their other sessions end (this one too). */
export async function changeOwnPassword({ userId, body }: { userId: number; body: ChangeOwnPasswordBody }) {
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.id, userId));
  if (!user) throw notFound('Your account');
  if (!(await verifyPassword(user.passwordHash, body.currentPassword))) {
    throw new AppError('invalid', 'Your current password is not right.', {
      issues: [{ path: 'currentPassword', message: 'Your current password is not right.' }],
    });
  }
  const passwordHash = await hashPassword(body.newPassword);
  await db.transaction(async (tx) => {
    await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
    await bumpSessionVersion(tx, userId);
  });
}
