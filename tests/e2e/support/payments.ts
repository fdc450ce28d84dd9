// The browser tests' payment fake (see stack.ts) and a quick way to get a plan's quote
// accepted and paid through the same public calls and card page the customer uses.
import { expect, type APIRequestContext } from '@playwright/test';

export const CARDS = { approved: '4242 4242 4242 4242', declined: '4000 0000 0000 0002' } as const;

/** As the yard hand makes a link; as the customer accepts it and pays the deposit by card. */
export async function acceptAndPayDeposit(request: APIRequestContext, planId: number) {
  const link = await request.post(`/api/plans/${planId}/quote-link`);
  expect(link.status()).toBe(201);
  const token = new URL((await link.json()).url).pathname.split('/').pop()!;
  const accepted = await request.post(`/api/quote-links/${token}/accept`, {
    data: { name: 'Test Customer', nonReturnable: true },
  });
  expect(accepted.status()).toBe(200);
  const started = await request.post(`/api/quote-links/${token}/pay`, { data: { share: 'deposit' } });
  // A re-planned job whose earlier payment already covers the new deposit has nothing to pay.
  if (started.status() === 409) return;
  expect(started.status()).toBe(200);
  const paid = await request.post((await started.json()).url, {
    form: { card: CARDS.approved, expiry: '12/30', cvc: '123' },
    maxRedirects: 0,
  });
  expect(paid.status()).toBe(303);
}
