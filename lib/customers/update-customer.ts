import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { customers, jobs } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';
import type { UpdateCustomerBody } from '@/lib/validations/customers';

/** Edits a customer; the jobs' copy of name, e-mail and phone follows in the same transaction. */
export async function updateCustomer({ customerId, body }: { customerId: number; body: UpdateCustomerBody }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(customers).where(eq(customers.id, customerId));
    if (!current) throw notFound('That customer');
    const next = { ...current, ...body };
    if (next.account === 'retail' && (body.creditDays != null || (body.discountPercent ?? 0) > 0)) {
      throw new AppError('invalid', 'Credit terms and discounts are for trade accounts only.');
    }
    const terms =
      next.account === 'retail'
        ? { creditDays: null, discountPercent: 0 }
        : { creditDays: next.creditDays ?? 30 };
    const [customer] = await tx
      .update(customers)
      .set({ ...body, ...terms, updatedAt: new Date() })
      .where(eq(customers.id, customerId))
      .returning();
    await tx
      .update(jobs)
      .set({ customerName: customer.name, customerEmail: customer.email, customerPhone: customer.phone })
      .where(eq(jobs.customerId, customerId));
    return customer;
  });
}
