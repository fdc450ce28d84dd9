// A customer, a job and its plan made through the real API, and the payment fake in-process with
// its webhook events delivered straight to the route handler.
import { POST as createJob } from '@/app/api/jobs/route';
import { POST as planJob } from '@/app/api/jobs/[jobId]/plans/route';
import { POST as createCustomer } from '@/app/api/customers/route';
import { POST as webhook } from '@/app/api/payments/webhook/route';
import * as schema from '@/db/schema';
import { eq } from 'drizzle-orm';
import type { Db } from '@/db/client';
import { startPaymentFake } from '@/lib/payments/payment-fake';
import { actAs, AS, call } from '../support/api';

export const SECRET_KEY = 'sk_test_vitest_only';
export const WEBHOOK_SECRET = 'whsec_vitest_only';

export async function startFakeForTests() {
  const delivered: { payload: string; signature: string; status: number }[] = [];
  const fake = await startPaymentFake({
    port: 0,
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhook: async (payload, signature) => {
      const res = await call(webhook, {
        method: 'POST',
        body: payload,
        headers: { 'stripe-signature': signature },
      });
      delivered.push({ payload, signature, status: res.status });
    },
  });
  process.env.KERFWISE_PAYMENTS_API_URL = fake.url;
  process.env.KERFWISE_PAYMENTS_SECRET_KEY = SECRET_KEY;
  process.env.KERFWISE_PAYMENTS_WEBHOOK_SECRET = WEBHOOK_SECRET;
  return { ...fake, delivered };
}

/** A customer (retail or trade), a draft job for them with two pieces, and its plan, as the yard hand. */
export async function plannedJobFor(db: Db, account: 'retail' | 'trade', reference: string) {
  actAs(AS.hand);
  const customer = await call(createCustomer, {
    method: 'POST',
    body: { name: `Test ${account} ${reference}`, email: 'buyer@example.com', account },
  });
  const job = await call(createJob, { method: 'POST', body: { customerId: customer.json.id, reference } });
  const [section] = await db.select().from(schema.sections).where(eq(schema.sections.code, 'T47100'));
  await db
    .insert(schema.jobItems)
    .values({ jobId: job.json.job.id, sectionId: section.id, lengthMm: 1800, quantity: 2 });
  const plan = await call(planJob, {
    method: 'POST',
    params: { jobId: String(job.json.job.id) },
    // Generous: the solver stops once the plan meets its bound, and a loaded machine must not change the plan.
    body: { useOffcuts: false, timeLimitMs: 10_000 },
  });
  if (plan.status !== 201) throw new Error(`planning failed: ${JSON.stringify(plan.json)}`);
  return {
    customerId: customer.json.id as number,
    jobId: job.json.job.id as number,
    planId: plan.json.id as number,
  };
}
