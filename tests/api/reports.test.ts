import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GET as waste } from '@/app/api/reports/waste/route';
import { GET as offcuts } from '@/app/api/reports/offcuts/route';
import { GET as savings } from '@/app/api/reports/savings/route';
import { GET as stock } from '@/app/api/reports/stock/route';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

// The test database is seeded as of 2026-11-20 with about sixteen weeks of history before it.
const range = 'from=2026-08-01&to=2026-11-20';
const url = (name: string, q = range) => `http://test.local/api/reports/${name}?${q}`;

describe('report endpoints', () => {
  it('are for the owner only', async () => {
    for (const [name, handler] of [
      ['waste', waste],
      ['offcuts', offcuts],
      ['savings', savings],
      ['stock', stock],
    ] as const) {
      actAs(AS.nobody);
      expect((await call(handler, { url: url(name) })).status, name).toBe(401);
      for (const who of [AS.hand, AS.saw]) {
        actAs(who);
        expect((await call(handler, { url: url(name) })).status, name).toBe(403);
      }
      actAs(AS.owner);
      expect((await call(handler, { url: url(name) })).status, name).toBe(200);
    }
  });

  it('refuses a missing or backwards range with 422', async () => {
    actAs(AS.owner);
    expect((await call(waste, { url: url('waste', 'from=2026-09-01') })).status).toBe(422);
    const backwards = await call(waste, { url: url('waste', 'from=2026-10-01&to=2026-09-01') });
    expect(backwards.status).toBe(422);
    expect(backwards.json.issues[0].message).toContain('start date');
  });

  it('the demo history gives consistent figures: waste equals material − pieces − kept', async () => {
    actAs(AS.owner);
    const { json } = await call(waste, { url: url('waste') });
    const totals = json.report.totals;
    expect(totals.boards).toBeGreaterThan(50);
    expect(totals.wasteMm).toBe(totals.materialMm - totals.pieceMm - totals.keptMm);
    expect(totals.yieldPercent).toBeGreaterThan(50);
    expect(totals.yieldPercent).toBeLessThanOrEqual(100);
    const weeklyWaste = json.report.weekly.reduce((n: number, w: { wasteMm: number }) => n + w.wasteMm, 0);
    expect(weeklyWaste).toBe(totals.wasteMm);

    const saved = (await call(savings, { url: url('savings') })).json.report;
    expect(saved.jobs.length).toBeGreaterThan(10);
    // The solver's plans never cost more in new stock than the longest-first plan on the same stock.
    expect(saved.totals.savedPence).toBeGreaterThanOrEqual(0);
    expect(saved.jobs.at(-1).runningSavedPence).toBe(saved.totals.savedPence);
  });

  it('an empty range answers with zero figures rather than an error', async () => {
    actAs(AS.owner);
    const { status, json } = await call(waste, { url: url('waste', 'from=2020-01-06&to=2020-01-19') });
    expect(status).toBe(200);
    expect(json.report.totals.boards).toBe(0);
    expect(json.report.weekly).toHaveLength(2);
    const s = (await call(savings, { url: url('savings', 'from=2020-01-06&to=2020-01-19') })).json.report;
    expect(s.jobs).toEqual([]);
  });
});
