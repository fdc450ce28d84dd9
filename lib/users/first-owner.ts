// Creates the first owner of a yard with no accounts yet: the production way in (no demo users).
import { sql } from 'drizzle-orm';
import { hashPassword } from '@/lib/auth/password';
import { createUserBodySchema } from '@/lib/validations/users';
import * as schema from '@/db/schema';
import type { Db } from '@/db/types';

/** The yard name until the owner sets theirs on the settings page. */
const NEW_YARD_NAME = 'My timber yard';

export type FirstOwnerResult = { created: true; email: string } | { created: false; reason: string };

/** Creates the owner (and the yard's settings row) when the database has no users; else does nothing. */
export async function createFirstOwner(
  db: Db,
  input: { email: string; password: string; name?: string },
): Promise<FirstOwnerResult> {
  const parsed = createUserBodySchema.safeParse({ ...input, name: input.name ?? 'Owner', role: 'owner' });
  if (!parsed.success) {
    throw new Error(`The first owner is not valid: ${parsed.error.issues.map((i) => i.message).join(' ')}`);
  }
  const { email, name, password } = parsed.data;
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const [{ count }] = await tx.select({ count: sql<number>`count(*)::int` }).from(schema.users);
    if (count > 0) return { created: false, reason: 'the yard already has accounts' };
    await tx.insert(schema.users).values({ email, name, role: 'owner', passwordHash });
    await tx.insert(schema.yardSettings).values({ id: 1, yardName: NEW_YARD_NAME }).onConflictDoNothing();
    return { created: true, email };
  });
}
