import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { GET as getPlan } from '@/app/api/plans/[planId]/route';
import { POST as release } from '@/app/api/plans/[planId]/release/route';
import { DELETE as revokeLink, POST as createLink } from '@/app/api/plans/[planId]/quote-link/route';
import { GET as openLink } from '@/app/api/quote-links/[token]/route';
import { POST as accept } from '@/app/api/quote-links/[token]/accept/route';
import { POST as pay } from '@/app/api/quote-links/[token]/pay/route';
import { POST as webhook } from '@/app/api/payments/webhook/route';
import { POST as refund } from '@/app/api/jobs/[jobId]/refund/route';
import { PATCH as patchJob } from '@/app/api/jobs/[jobId]/route';
import * as schema from '@/db/schema';
import { TEST_CARDS } from '@/lib/payments/payment-fake';
import { signWebhookPayload } from '@/lib/payments/sign-webhook';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate, createTestDb } from '../support/test-db';
import { plannedJobFor, startFakeForTests, WEBHOOK_SECRET } from './quote-fixtures';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let fake: Awaited<ReturnType<typeof startFakeForTests>>;
beforeAll(async () => {
  fake = await startFakeForTests();
  await (await createTestDb()).close(); // builds the seeded template once, with time to spare
}, 600_000);
beforeEach(async () => {
  t = await useApiTestDb();
  fake.delivered.length = 0;
});
afterEach(() => t.close());
afterAll(async () => {
  await fake.close();
  await closeTemplate();
});

const p = (planId: number) => ({ params: { planId: String(planId) } });
const tok = (token: string) => ({ params: { token } });
const releasePlan = (planId: number, body?: unknown) => call(release, { method: 'POST', ...p(planId), body });

async function linkFor(planId: number) {
  actAs(AS.hand);
  const res = await call(createLink, { method: 'POST', ...p(planId) });
  expect(res.status).toBe(201);
  return { ...res.json, token: new URL(res.json.url).pathname.split('/').pop() as string };
}

/** The customer pays on the fake's card page; the fake posts its signed event to the webhook. */
async function payWithCard(token: string, card: string) {
  actAs(AS.nobody);
  const started = await call(pay, { method: 'POST', ...tok(token), body: { share: 'deposit' } });
  expect(started.status).toBe(200);
  return fetch(started.json.url, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ card, expiry: '12/30', cvc: '123' }),
  });
}

const ledger = (jobId: number) => t.db.select().from(schema.payments).where(eq(schema.payments.jobId, jobId));

describe('the quote on a plan', () => {
  it('carries number, validity, lines and VAT in whole pence', async () => {
    const { planId } = await plannedJobFor(t.db, 'trade', 'J-Q1');
    const { json } = await call(getPlan, p(planId));
    expect(json.quote).toMatchObject({ number: 'J-Q1/Q1', vatRatePercent: 20, account: 'trade' });
    expect(json.quote.netPence + json.quote.vatPence).toBe(json.quote.grossPence);
    expect(json.quote.vatPence).toBe(Math.floor(json.quote.netPence / 5));
    expect(Date.parse(json.quote.validUntil)).toBeGreaterThan(Date.now());
    for (const line of json.quote.lines) expect(Number.isInteger(line.amountPence)).toBe(true);
  });
});

describe('quote link tokens', () => {
  it('opens without a session; a changed character is 404, revoked and expired are 410', async () => {
    const { planId } = await plannedJobFor(t.db, 'retail', 'J-Q2');
    const { token, expiresAt } = await linkFor(planId);
    expect(Date.parse(expiresAt)).toBeGreaterThan(Date.now());
    actAs(AS.nobody);
    const opened = await call(openLink, tok(token));
    expect(opened.status).toBe(200);
    expect(opened.json.quote.number).toBe('J-Q2/Q1');
    const flipped = token.slice(0, -1) + (token.endsWith('A') ? 'B' : 'A');
    expect((await call(openLink, tok(flipped))).status).toBe(404);

    const second = await linkFor(planId);
    await t.db.update(schema.quoteLinks).set({ expiresAt: new Date(Date.now() - 1000) });
    actAs(AS.nobody);
    const expired = await call(openLink, tok(second.token));
    expect(expired.status).toBe(410);
    expect(expired.json.error).toMatch(/expired/);

    const third = await linkFor(planId);
    expect((await call(revokeLink, { method: 'DELETE', ...p(planId) })).json.revoked).toBe(3);
    actAs(AS.nobody);
    const revoked = await call(openLink, tok(third.token));
    expect(revoked.status).toBe(410);
    expect(revoked.json.error).toMatch(/withdrawn/);
  });
});

describe('release rule', () => {
  it('refuses an unaccepted retail job (409 saying what is missing); the owner overrides with a reason', async () => {
    const { planId } = await plannedJobFor(t.db, 'retail', 'J-Q3');
    actAs(AS.hand);
    const refused = await releasePlan(planId);
    expect(refused.status).toBe(409);
    expect(refused.json.error).toMatch(/not accepted the quote/);
    expect((await releasePlan(planId, { override: 'Customer paid cash at the counter' })).status).toBe(403);
    actAs(AS.owner);
    expect((await releasePlan(planId, { override: 'Customer paid cash at the counter' })).status).toBe(200);
    const [plan] = await t.db.select().from(schema.plans).where(eq(schema.plans.id, planId));
    expect(plan).toMatchObject({
      status: 'released',
      releaseOverrideReason: 'Customer paid cash at the counter',
      releaseOverrideBy: AS.owner,
    });
  });

  it('lets a trade account accept on account and release without paying; retail cannot', async () => {
    const trade = await plannedJobFor(t.db, 'trade', 'J-Q4');
    const { token } = await linkFor(trade.planId);
    actAs(AS.nobody);
    const accepted = await call(accept, {
      method: 'POST',
      ...tok(token),
      body: { name: 'Sam Buyer', nonReturnable: true, onAccount: true },
      headers: { 'x-forwarded-for': '203.0.113.9' },
    });
    expect(accepted.status).toBe(200);
    const [quote] = await t.db.select().from(schema.quotes).where(eq(schema.quotes.planId, trade.planId));
    expect(quote).toMatchObject({ acceptedName: 'Sam Buyer', acceptedIp: '203.0.113.9', onAccount: true });
    actAs(AS.hand);
    expect((await releasePlan(trade.planId)).status).toBe(200);

    const retail = await plannedJobFor(t.db, 'retail', 'J-Q5');
    const link = await linkFor(retail.planId);
    actAs(AS.nobody);
    expect(
      (
        await call(accept, {
          method: 'POST',
          ...tok(link.token),
          body: { name: 'Pat', nonReturnable: true, onAccount: true },
        })
      ).status,
    ).toBe(422);
    expect(
      (
        await call(accept, {
          method: 'POST',
          ...tok(link.token),
          body: { name: 'Pat', nonReturnable: false },
        })
      ).status,
    ).toBe(422);
  });
});

describe('paying through the payment service', () => {
  it('a declined card leaves the job unpaid; an approved one records the deposit and allows release', async () => {
    const { planId, jobId } = await plannedJobFor(t.db, 'retail', 'J-Q6');
    const { token } = await linkFor(planId);
    actAs(AS.nobody);
    expect((await call(pay, { method: 'POST', ...tok(token), body: { share: 'deposit' } })).status).toBe(409); // not accepted yet
    await call(accept, {
      method: 'POST',
      ...tok(token),
      body: { name: 'Robin Customer', nonReturnable: true },
    });

    const declined = await payWithCard(token, TEST_CARDS.declined);
    expect(declined.status).toBe(402);
    expect(fake.delivered.map((d) => d.status)).toEqual([200]);
    expect((await ledger(jobId)).map((r) => r.status)).toEqual(['failed']);
    actAs(AS.hand);
    const refused = await releasePlan(planId);
    expect(refused.status).toBe(409);
    expect(refused.json.error).toMatch(/not paid the deposit/);

    const approved = await payWithCard(token, TEST_CARDS.approved);
    expect(approved.status).toBe(303);
    expect(approved.headers.get('location')).toContain(`/q/${token}`);
    const [quote] = await t.db.select().from(schema.quotes).where(eq(schema.quotes.planId, planId));
    const paid = (await ledger(jobId)).filter((r) => r.status === 'succeeded');
    expect(paid).toHaveLength(1);
    expect(paid[0]).toMatchObject({
      kind: 'deposit',
      amountPence: quote.depositPence,
      byName: 'Robin Customer',
    });
    expect(paid[0].eventId).toMatch(/^evt_/);
    actAs(AS.nobody);
    expect((await call(openLink, tok(token))).json.payment.state).toBe('deposit_paid');
    actAs(AS.hand);
    expect((await releasePlan(planId)).status).toBe(200);
  });

  it('pennies left under the smallest card payment are not charged by card and do not block release', async () => {
    const { planId, jobId } = await plannedJobFor(t.db, 'retail', 'J-Q8');
    const { token } = await linkFor(planId);
    actAs(AS.nobody);
    await call(accept, {
      method: 'POST',
      ...tok(token),
      body: { name: 'Robin Customer', nonReturnable: true },
    });
    expect((await payWithCard(token, TEST_CARDS.approved)).status).toBe(303);
    const [paid] = (await ledger(jobId)).filter((r) => r.status === 'succeeded');
    // As after a re-plan that moved the price up by pennies: 18p more deposit, 18p left in all.
    const byPlan = eq(schema.quotes.planId, planId);
    await t.db
      .update(schema.quotes)
      .set({ depositPence: paid.amountPence + 18, grossPence: paid.amountPence + 18 })
      .where(byPlan);

    actAs(AS.nobody);
    const deposit = await call(pay, { method: 'POST', ...tok(token), body: { share: 'deposit' } });
    expect(deposit.status).toBe(409);
    expect(deposit.json.error).toBe('The deposit is already paid.');
    const rest = await call(pay, { method: 'POST', ...tok(token), body: { share: 'full' } });
    expect(rest.status).toBe(409);
    expect(rest.json.error).toContain('£0.18 is left to pay, less than the smallest card payment (£0.30)');
    expect((await call(openLink, tok(token))).json.payment).toMatchObject({
      state: 'deposit_paid',
      depositDuePence: 0,
      balancePence: 18,
    });
    actAs(AS.hand);
    expect((await releasePlan(planId)).status).toBe(200);
  });

  it('a replayed event changes nothing; a missing or wrong signature is 400 and records nothing', async () => {
    const { planId, jobId } = await plannedJobFor(t.db, 'retail', 'J-Q7');
    const { token } = await linkFor(planId);
    actAs(AS.nobody);
    await call(accept, { method: 'POST', ...tok(token), body: { name: 'Robin', nonReturnable: true } });
    await payWithCard(token, TEST_CARDS.approved);
    const [event] = fake.delivered;
    expect(await ledger(jobId)).toHaveLength(1);

    const replay = await call(webhook, {
      method: 'POST',
      body: event.payload,
      headers: { 'stripe-signature': event.signature },
    });
    expect(replay.status).toBe(200);
    expect(replay.json.recorded).toBe(false);
    expect(await ledger(jobId)).toHaveLength(1);

    const forged = event.payload.replace(/"evt_[0-9a-f]+"/, '"evt_forged"');
    const wrongKey = signWebhookPayload(forged, 'whsec_someone_else');
    expect(
      (await call(webhook, { method: 'POST', body: forged, headers: { 'stripe-signature': wrongKey } }))
        .status,
    ).toBe(400);
    const tampered = await call(webhook, {
      method: 'POST',
      body: forged,
      headers: { 'stripe-signature': event.signature },
    });
    expect(tampered.status).toBe(400);
    expect((await call(webhook, { method: 'POST', body: forged })).status).toBe(400);
    const rightKey = signWebhookPayload(forged, WEBHOOK_SECRET);
    expect(
      (await call(webhook, { method: 'POST', body: forged, headers: { 'stripe-signature': rightKey } }))
        .status,
    ).toBe(200);
    expect(await ledger(jobId)).toHaveLength(2); // only the correctly signed one counted
  });

  it('the owner refunds a cancelled job through the service; its webhook writes the ledger once', async () => {
    const { planId, jobId } = await plannedJobFor(t.db, 'retail', 'J-Q8');
    const { token } = await linkFor(planId);
    actAs(AS.nobody);
    await call(accept, { method: 'POST', ...tok(token), body: { name: 'Robin', nonReturnable: true } });
    await payWithCard(token, TEST_CARDS.approved);
    const [deposit] = await ledger(jobId);
    const refundBody = {
      method: 'POST',
      params: { jobId: String(jobId) },
      body: { reason: 'Customer cancelled' },
    };

    actAs(AS.owner);
    const early = await call(refund, refundBody);
    expect(early.status).toBe(409); // the job must be cancelled first
    expect(early.json.error).toMatch(/Cancel job J-Q8/);
    actAs(AS.hand);
    expect(
      (await call(patchJob, { ...refundBody, method: 'PATCH', body: { status: 'cancelled' } })).status,
    ).toBe(200);
    expect((await call(refund, refundBody)).status).toBe(403);

    actAs(AS.owner);
    fake.delivered.length = 0;
    const done = await call(refund, refundBody);
    expect(done.status).toBe(200);
    expect(done.json.requestedPence).toBe(deposit.amountPence);
    expect(fake.delivered.map((d) => JSON.parse(d.payload).type)).toEqual(['refund.created']);
    const rows = await ledger(jobId);
    expect(rows.find((r) => r.kind === 'refund')).toMatchObject({
      amountPence: -deposit.amountPence,
      userId: AS.owner,
      note: 'Customer cancelled',
      status: 'succeeded',
    });
    expect(rows.reduce((sum, r) => sum + (r.status === 'succeeded' ? r.amountPence : 0), 0)).toBe(0);

    const [event] = fake.delivered;
    await call(webhook, {
      method: 'POST',
      body: event.payload,
      headers: { 'stripe-signature': event.signature },
    });
    expect(await ledger(jobId)).toHaveLength(rows.length); // a replayed refund event changes nothing
    const again = await call(refund, refundBody);
    expect(again.status).toBe(409);
    expect(again.json.error).toMatch(/no card payment left/);
  });
});
