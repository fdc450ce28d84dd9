// `tsx scripts/payment-fake.ts`: the local payment-service fake for development and browser tests.
// It listens on KERFWISE_PAYMENTS_API_URL and posts signed events to KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL.
import { getEnv } from '../lib/env';
import { startPaymentFake } from '../lib/payments/payment-fake';

const env = getEnv();
const api = new URL(env.KERFWISE_PAYMENTS_API_URL ?? 'http://127.0.0.1:12111');
const webhook = env.KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL ?? 'http://localhost:3000/api/payments/webhook';

startPaymentFake({
  port: Number(api.port),
  host: api.hostname,
  secretKey: env.KERFWISE_PAYMENTS_SECRET_KEY,
  webhookSecret: env.KERFWISE_PAYMENTS_WEBHOOK_SECRET,
  webhook,
}).then(
  (fake) => {
    console.log(`Payment fake: API and card pages on ${fake.url}, events posted to ${webhook}`);
    for (const signal of ['SIGINT', 'SIGTERM'] as const)
      process.on(signal, () => fake.close().then(() => process.exit(0)));
  },
  (error: Error) => {
    console.error(`Payment fake could not start: ${error.message}`);
    process.exit(1);
  },
);
