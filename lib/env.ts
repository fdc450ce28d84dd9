// The app's settings from process.env; with db/env.ts (which this extends) the only place reading it.
// The database's own settings (data folder, server URL, pool) are defined in db/env.ts.
import { z } from 'zod';
import { databaseEnvSchema } from '@/db/env';

const envSchema = databaseEnvSchema.extend({
  // Server mode: how long a solver run may stay active before it counts as crashed and is retried,
  // and how often the queue looks for such runs.
  KERFWISE_PLAN_RUN_EXPIRE_SECONDS: z.coerce.number().int().min(5).default(120),
  KERFWISE_QUEUE_MAINTENANCE_SECONDS: z.coerce.number().int().min(1).default(30),
  // CPU priority of the solver threads (0 = normal, 19 = lowest), in the app and in workers alike:
  // solving yields to page requests and the saw's polling when they share cores.
  KERFWISE_SOLVER_NICE: z.coerce.number().int().min(0).max(19).default(10),
  NEXTAUTH_SECRET: z.string().min(16).optional(),
  NEXTAUTH_URL: z.string().url().optional(),
  KERFWISE_SMTP_HOST: z.string().default('127.0.0.1'),
  KERFWISE_SMTP_PORT: z.coerce.number().int().positive().default(2525),
  KERFWISE_MAIL_FROM: z.string().default('Kerfwise <cutting@yard.test>'),
  // Development and tests: the local mail catcher's HTTP address, so the outbox can show caught mail.
  KERFWISE_MAIL_CATCHER_URL: z.string().url().optional(),
  // Seed the demo yard (demo users with a known password) into an empty database at start.
  KERFWISE_DEMO: z
    .enum(['0', '1', 'true', 'false', ''])
    .optional()
    .transform((v) => v === '1' || v === 'true'),
  // Create the first owner at start when the database has no accounts yet.
  KERFWISE_OWNER_EMAIL: z.string().optional(),
  KERFWISE_OWNER_PASSWORD: z.string().optional(),
  KERFWISE_OWNER_NAME: z.string().optional(),
  // The payment service. Leave KERFWISE_PAYMENTS_API_URL unset to use the real service's own address;
  // development and tests point it at the local fake (scripts/payment-fake.ts).
  KERFWISE_PAYMENTS_API_URL: z.string().url().optional(),
  KERFWISE_PAYMENTS_SECRET_KEY: z.string().min(1).default('sk_test_kerfwise_local_fake'),
  KERFWISE_PAYMENTS_WEBHOOK_SECRET: z.string().min(1).default('whsec_kerfwise_local_fake'),
  // The local fake only: where it posts its signed webhook events.
  KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL: z.string().url().optional(),
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
});

export type Env = z.infer<typeof envSchema>;

export function getEnv(): Env {
  return envSchema.parse(process.env);
}
