import { eq, sql } from 'drizzle-orm';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GET as getSections, POST as postSection } from '@/app/api/sections/route';
import { PATCH as patchSection } from '@/app/api/sections/[sectionId]/route';
import { GET as getMovements } from '@/app/api/stock/movements/route';
import { POST as postReceipt } from '@/app/api/stock/receipts/route';
import { POST as postStocktake } from '@/app/api/stock/stocktakes/route';
import { GET as getSettings, PATCH as patchSettings } from '@/app/api/settings/route';
import { GET as stockCheck } from '@/app/api/plans/[planId]/stock-check/route';
import * as schema from '@/db/schema';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

async function countedLength() {
  const [l] = await t.db
    .select()
    .from(schema.stockLengths)
    .where(sql`${schema.stockLengths.onHand} is not null`)
    .orderBy(schema.stockLengths.id)
    .limit(1);
  return l;
}
async function movementSum(stockLengthId: number) {
  const [{ n }] = await t.db
    .select({ n: sql<number>`coalesce(sum(quantity_delta), 0)::int` })
    .from(schema.stockMovements)
    .where(eq(schema.stockMovements.stockLengthId, stockLengthId));
  return n;
}

const sectionBody = {
  code: 'T63150',
  name: '63×150 C24 treated',
  thicknessMm: 63,
  widthMm: 150,
  species: 'European redwood',
  grade: 'C24',
  treatment: 'Treated UC3',
  active: true,
  lengths: [
    { lengthMm: 3600, pricePence: 2400, unlimited: false },
    { lengthMm: 4800, pricePence: 3100, unlimited: true },
  ],
};

describe('role checks on every stock endpoint', () => {
  it('answers 401 signed out and refuses roles without the action', async () => {
    const l = await countedLength();
    const receipt = { reference: 'DN-1', lines: [{ stockLengthId: l.id, quantity: 2 }] };
    const stocktake = { reason: 'count', counts: [{ stockLengthId: l.id, counted: 3 }] };
    const settings = {
      yardName: 'Y',
      kerfMm: 3,
      trimMm: 5,
      minOffcutMm: 300,
      displayUnit: 'mm',
      perCutChargePence: 25,
      clearOffcutsAfterDays: 90,
    };
    const cases: [string, () => Promise<{ status: number }>, (number | null)[], (number | null)[]][] = [
      ['GET sections', () => call(getSections), [AS.owner, AS.hand, AS.saw], []],
      [
        'POST section',
        () => call(postSection, { method: 'POST', body: sectionBody }),
        [AS.owner],
        [AS.hand, AS.saw],
      ],
      [
        'PATCH section',
        () =>
          call(patchSection, {
            method: 'PATCH',
            params: { sectionId: String(l.sectionId) },
            body: { ...sectionBody, code: 'X1', lengths: [] },
          }),
        [AS.owner],
        [AS.hand, AS.saw],
      ],
      [
        'POST receipt',
        () => call(postReceipt, { method: 'POST', body: receipt }),
        [AS.owner, AS.hand],
        [AS.saw],
      ],
      [
        'POST stocktake',
        () => call(postStocktake, { method: 'POST', body: stocktake }),
        [AS.owner],
        [AS.hand, AS.saw],
      ],
      ['GET movements', () => call(getMovements), [AS.owner, AS.hand], [AS.saw]],
      ['GET settings', () => call(getSettings), [AS.owner, AS.hand, AS.saw], []],
      [
        'PATCH settings',
        () => call(patchSettings, { method: 'PATCH', body: settings }),
        [AS.owner],
        [AS.hand, AS.saw],
      ],
      [
        'GET stock check',
        () => call(stockCheck, { params: { planId: '1' } }),
        [AS.owner, AS.hand],
        [AS.saw], // office plan views are not for the saw operator
      ],
    ];
    for (const [name, run, allowed, refused] of cases) {
      actAs(AS.nobody);
      expect((await run()).status, `${name} signed out`).toBe(401);
      for (const who of refused) {
        actAs(who);
        expect((await run()).status, `${name} as ${who}`).toBe(403);
      }
      for (const who of allowed) {
        actAs(who);
        expect((await run()).status, `${name} as ${who}`).toBeLessThan(300);
      }
    }
  });
});

describe('receipts and stocktakes', () => {
  it('a delivery raises on-hand and records who, when and why', async () => {
    const l = await countedLength();
    actAs(AS.hand);
    const res = await call(postReceipt, {
      method: 'POST',
      body: { reference: 'DN-7788 Northwood Timber', lines: [{ stockLengthId: l.id, quantity: 12 }] },
    });
    expect(res.status).toBe(201);
    const [after] = await t.db.select().from(schema.stockLengths).where(eq(schema.stockLengths.id, l.id));
    expect(after.onHand).toBe(l.onHand! + 12);
    expect(await movementSum(l.id)).toBe(after.onHand);
    expect(res.json.movements[0]).toMatchObject({
      kind: 'receipt',
      userId: AS.hand,
      quantityDelta: 12,
      reason: 'DN-7788 Northwood Timber',
      valuePence: 12 * l.pricePence,
    });
  });

  it('a stocktake records the difference, never a negative count, and counts an unlimited length from then on', async () => {
    const l = await countedLength();
    actAs(AS.owner);
    const res = await call(postStocktake, {
      method: 'POST',
      body: { reason: 'Monthly count', counts: [{ stockLengthId: l.id, counted: 2 }] },
    });
    expect(res.status).toBe(201);
    expect(res.json.movements[0].quantityDelta).toBe(2 - l.onHand!);
    expect(await movementSum(l.id)).toBe(2);
    const neg = await call(postStocktake, {
      method: 'POST',
      body: { reason: 'x', counts: [{ stockLengthId: l.id, counted: -1 }] },
    });
    expect(neg.status).toBe(422);

    const [unlimited] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(sql`${schema.stockLengths.onHand} is null`)
      .limit(1);
    await call(postStocktake, {
      method: 'POST',
      body: { reason: 'Start counting CLS', counts: [{ stockLengthId: unlimited.id, counted: 40 }] },
    });
    const [counted] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(eq(schema.stockLengths.id, unlimited.id));
    expect(counted.onHand).toBe(40);
    expect(await movementSum(unlimited.id)).toBe(40);
  });

  it('bad lines are refused with 422 and an unknown stock length with 404, changing nothing', async () => {
    const l = await countedLength();
    actAs(AS.owner);
    const bad = await call(postReceipt, {
      method: 'POST',
      body: { reference: '', lines: [{ stockLengthId: l.id, quantity: 0 }] },
    });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'lines.0.quantity',
      'reference',
    ]);
    const unknown = await call(postReceipt, {
      method: 'POST',
      body: {
        reference: 'DN',
        lines: [
          { stockLengthId: l.id, quantity: 3 },
          { stockLengthId: 99_999, quantity: 1 },
        ],
      },
    });
    expect(unknown.status).toBe(404);
    expect(await movementSum(l.id)).toBe(l.onHand); // the first line was rolled back too
  });
});

describe('sections catalogue', () => {
  it('the owner adds a section with stock lengths; a new counted length starts at zero', async () => {
    actAs(AS.owner);
    const res = await call(postSection, { method: 'POST', body: sectionBody });
    expect(res.status).toBe(201);
    const list = await call(getSections);
    const added = list.json.sections.find((s: { code: string }) => s.code === 'T63150');
    expect(
      added.lengths.map((l: { lengthMm: number; onHand: number | null }) => [l.lengthMm, l.onHand]),
    ).toEqual([
      [3600, 0],
      [4800, null],
    ]);
    expect((await call(postSection, { method: 'POST', body: sectionBody })).status).toBe(409);
  });

  it('rejects a repeated stock length and a section that does not exist', async () => {
    actAs(AS.owner);
    const dup = await call(postSection, {
      method: 'POST',
      body: { ...sectionBody, lengths: [sectionBody.lengths[0], sectionBody.lengths[0]] },
    });
    expect(dup.status).toBe(422);
    expect(
      (await call(patchSection, { method: 'PATCH', params: { sectionId: '999' }, body: sectionBody })).status,
    ).toBe(404);
  });
});

describe('plan stock check', () => {
  it('lists the lengths a pending plan needs more of than are on hand', async () => {
    const l = await countedLength();
    const [job] = await t.db
      .insert(schema.jobs)
      .values({ reference: 'J-T1', customerName: 'Test' })
      .returning();
    const [plan] = await t.db
      .insert(schema.plans)
      .values({ jobId: job.id, settings: {}, sections: [], totals: {} })
      .returning();
    await t.db.insert(schema.planBoards).values(
      Array.from({ length: l.onHand! + 2 }, (_, i) => ({
        planId: plan.id,
        boardNo: i + 1,
        sectionId: l.sectionId,
        source: 'stock' as const,
        stockLengthId: l.id,
        lengthMm: l.lengthMm,
        pieces: [],
        remainderMm: 0,
        keepRemainder: false,
      })),
    );
    actAs(AS.hand);
    const res = await call(stockCheck, { params: { planId: String(plan.id) } });
    expect(res.status).toBe(200);
    expect(res.json.short).toEqual([
      expect.objectContaining({
        stockLengthId: l.id,
        lengthMm: l.lengthMm,
        needed: l.onHand! + 2,
        onHand: l.onHand,
      }),
    ]);
    expect((await call(stockCheck, { params: { planId: '99999' } })).status).toBe(404);
  });
});

describe('yard settings', () => {
  it('the owner changes the kerf; bad values get field messages', async () => {
    actAs(AS.owner);
    const body = {
      yardName: 'Brackenridge Timber & Saw',
      kerfMm: 4,
      trimMm: 10,
      minOffcutMm: 400,
      displayUnit: 'imperial',
      region: 'na',
      minSafePieceMm: 200,
      perCutChargePence: 30,
      clearOffcutsAfterDays: 60,
    };
    const ok = await call(patchSettings, { method: 'PATCH', body });
    expect(ok.status).toBe(200);
    expect(ok.json.settings).toMatchObject(body);
    const bad = await call(patchSettings, {
      method: 'PATCH',
      body: { ...body, kerfMm: 2.5, minOffcutMm: 10, region: 'eu', minSafePieceMm: 10 },
    });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'kerfMm',
      'minOffcutMm',
      'minSafePieceMm',
      'region',
    ]);
  });
});
