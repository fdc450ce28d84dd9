import 'server-only';
import { eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { customers } from '@/db/schema';
import { AppError } from '@/lib/errors';

/** The customer a job is for: the chosen record, or the one with this name, or a new retail one. */
export async function resolveJobCustomer(
  tx: DbOrTx,
  { customerId, name, email }: { customerId?: number; name?: string; email?: string },
) {
  if (customerId !== undefined) {
    const [customer] = await tx.select().from(customers).where(eq(customers.id, customerId));
    if (!customer) throw new AppError('invalid', 'That customer does not exist; choose another or add them.');
    return customer;
  }
  const trimmed = (name ?? '').trim();
  const [existing] = await tx
    .select()
    .from(customers)
    .where(sql`lower(${customers.name}) = lower(${trimmed})`)
    .limit(1);
  if (existing) return existing;
  const [created] = await tx
    .insert(customers)
    .values({ name: trimmed, email: email ?? '', account: 'retail' })
    .returning();
  return created;
}
