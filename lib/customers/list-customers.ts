import 'server-only';
import { asc, ilike, or } from 'drizzle-orm';
import { getDb } from '@/db';
import { customers } from '@/db/schema';

/** Customers by name; `q` matches name, contact, e-mail or phone. */
export async function listCustomers({ q }: { q?: string }) {
  const db = await getDb();
  const pattern = q ? `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  return db
    .select()
    .from(customers)
    .where(
      pattern
        ? or(
            ilike(customers.name, pattern),
            ilike(customers.contact, pattern),
            ilike(customers.email, pattern),
            ilike(customers.phone, pattern),
          )
        : undefined,
    )
    .orderBy(asc(customers.name))
    .limit(200);
}
