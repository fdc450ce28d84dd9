import 'server-only';
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { users } from '@/db/schema';
import { hashPassword } from '@/lib/auth/password';
import { AppError, notFound } from '@/lib/errors';
import type { CreateUserBody, UpdateUserBody } from '@/lib/validations/users';

const publicColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  disabled: users.disabled,
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
      .set({ name: changes.name, role: changes.role, disabled: changes.disabled, passwordHash })
      .where(eq(users.id, userId))
      .returning(publicColumns);
    return updated;
  });
}
