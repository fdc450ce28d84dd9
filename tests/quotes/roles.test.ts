import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listCustomers, POST as createCustomer } from '@/app/api/customers/route';
import { PATCH as updateCustomer } from '@/app/api/customers/[customerId]/route';
import { POST as importCustomers } from '@/app/api/customers/import/route';
import { POST as refund } from '@/app/api/jobs/[jobId]/refund/route';
import { GET as paymentsOverview } from '@/app/api/payments/route';
import { POST as webhook } from '@/app/api/payments/webhook/route';
import { DELETE as revokeLink, POST as createLink } from '@/app/api/plans/[planId]/quote-link/route';
import { GET as openLink } from '@/app/api/quote-links/[token]/route';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate, createTestDb } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeAll(async () => {
  await (await createTestDb()).close();
}, 600_000);
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

type Who = keyof typeof AS;
// Every new signed-in endpoint with the roles that may use it (the design's roles table).
const endpoints: { name: string; allowed: Who[]; run: () => ReturnType<typeof call> }[] = [
  {
    name: 'GET /api/customers',
    allowed: ['owner', 'hand'],
    run: () => call(listCustomers, { url: 'http://test.local/api/customers?q=fen' }),
  },
  {
    name: 'POST /api/customers',
    allowed: ['owner', 'hand'],
    run: () => call(createCustomer, { method: 'POST', body: { name: 'Role Test', account: 'retail' } }),
  },
  {
    name: 'PATCH /api/customers/1',
    allowed: ['owner', 'hand'],
    run: () =>
      call(updateCustomer, { method: 'PATCH', params: { customerId: '1' }, body: { phone: '01632 960000' } }),
  },
  {
    name: 'POST /api/customers/import',
    allowed: ['owner', 'hand'],
    run: () =>
      call(importCustomers, {
        method: 'POST',
        headers: { 'content-type': 'text/csv' },
        body: 'name,account\nRole Import,retail\n',
      }),
  },
  {
    name: 'POST /api/plans/1/quote-link',
    allowed: ['owner', 'hand'],
    run: () => call(createLink, { method: 'POST', params: { planId: '1' } }),
  },
  {
    name: 'DELETE /api/plans/1/quote-link',
    allowed: ['owner', 'hand'],
    run: () => call(revokeLink, { method: 'DELETE', params: { planId: '1' } }),
  },
  { name: 'GET /api/payments', allowed: ['owner'], run: () => call(paymentsOverview) },
  {
    name: 'POST /api/jobs/4/refund',
    allowed: ['owner'],
    run: () => call(refund, { method: 'POST', params: { jobId: '4' }, body: { reason: 'Role test' } }),
  },
];

describe('every role on every new endpoint', () => {
  for (const endpoint of endpoints) {
    it(endpoint.name, async () => {
      for (const who of ['nobody', 'saw', 'hand', 'owner'] as Who[]) {
        actAs(AS[who]);
        const { status } = await endpoint.run();
        if (who === 'nobody') expect(status, who).toBe(401);
        else if (endpoint.allowed.includes(who))
          expect([401, 403], `${who}: ${status}`).not.toContain(status);
        else expect(status, who).toBe(403);
      }
    });
  }

  it('the public quote link and the webhook need no session, and give nothing away without a token or signature', async () => {
    actAs(AS.nobody);
    expect((await call(openLink, { params: { token: 'x'.repeat(43) } })).status).toBe(404);
    expect((await call(webhook, { method: 'POST', body: '{"id":"evt_1"}' })).status).toBe(400);
  });
});

describe('customers', () => {
  it('creates retail and trade customers, finds them by search, refuses trade terms on retail', async () => {
    actAs(AS.hand);
    const trade = await call(createCustomer, {
      method: 'POST',
      body: {
        name: 'Oakhurst Roofing',
        email: 'a@oakhurst.example.com',
        account: 'trade',
        creditDays: 30,
        discountPercent: 5,
      },
    });
    expect(trade.status).toBe(201);
    expect(trade.json).toMatchObject({
      id: expect.any(Number),
      account: 'trade',
      creditDays: 30,
      discountPercent: 5,
    });
    const bad = await call(createCustomer, {
      method: 'POST',
      body: { name: 'Retail Person', account: 'retail', discountPercent: 10 },
    });
    expect(bad.status).toBe(422);
    const found = await call(listCustomers, { url: 'http://test.local/api/customers?q=oakhurst' });
    expect(found.json.customers.map((c: { name: string }) => c.name)).toEqual(['Oakhurst Roofing']);
  });

  it('imports a CSV all or nothing, naming each bad row', async () => {
    actAs(AS.hand);
    const before = (await call(listCustomers)).json.customers.length;
    const csv =
      'name,email,account,credit days\nGood One,good@example.com,trade,30\n,nobody@example.com,retail,\nBad Mail,not-an-email,retail,\n';
    const refused = await call(importCustomers, {
      method: 'POST',
      headers: { 'content-type': 'text/csv' },
      body: csv,
    });
    expect(refused.status).toBe(422);
    expect(refused.json.details.rows.map((r: { row: number }) => r.row)).toEqual([3, 4]);
    expect((await call(listCustomers)).json.customers.length).toBe(before);
    const ok = await call(importCustomers, {
      method: 'POST',
      headers: { 'content-type': 'text/csv' },
      body: 'name,account\nGood One,trade\nGood Two,retail\n',
    });
    expect(ok.json.imported).toBe(2);
  });

  it('the demo jobs point at customer records', async () => {
    const rows = await t.client.query<{ n: number }>(
      'select count(*)::int as n from jobs where customer_id is null',
    );
    expect(rows.rows[0].n).toBe(0);
  });
});
