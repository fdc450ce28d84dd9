// Signs a webhook payload the way the payment service does: HMAC-SHA256 of `${timestamp}.${payload}`
// with the endpoint's secret, sent as `Stripe-Signature: t=…,v1=…`. Written independently of the SDK,
// so the app's SDK check is a real check of the fake.
import { createHmac } from 'node:crypto';

export function signWebhookPayload(
  payload: string,
  secret: string,
  timestamp = Math.floor(Date.now() / 1000),
) {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${signature}`;
}
