import 'server-only';
import { getDb, type DbOrTx } from '@/db';
import { customers } from '@/db/schema';
import type { CreateCustomerBody } from '@/lib/validations/customers';

export async function createCustomer({ body }: { body: CreateCustomerBody }, tx?: DbOrTx) {
  const db = tx ?? (await getDb());
  const [customer] = await db
    .insert(customers)
    .values({ ...body, creditDays: body.account === 'trade' ? (body.creditDays ?? 30) : null })
    .returning();
  return customer;
}
