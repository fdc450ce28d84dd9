// The payment service's official SDK, configured from the environment only: pointing
// KERFWISE_PAYMENTS_API_URL at the local fake or leaving it unset for the real service is the
// whole difference between development and a live account.
import Stripe from 'stripe';
import { getEnv } from '@/lib/env';

export function paymentClient(): Stripe {
  const env = getEnv();
  const api = env.KERFWISE_PAYMENTS_API_URL ? new URL(env.KERFWISE_PAYMENTS_API_URL) : null;
  return new Stripe(env.KERFWISE_PAYMENTS_SECRET_KEY, {
    maxNetworkRetries: 0,
    timeout: 10_000,
    ...(api && {
      host: api.hostname,
      port: Number(api.port || (api.protocol === 'https:' ? 443 : 80)),
      protocol: api.protocol === 'https:' ? 'https' : 'http',
    }),
  });
}
