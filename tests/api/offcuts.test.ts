import { and, eq, inArray } from 'drizzle-orm';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GET as listOffcuts } from '@/app/api/offcuts/route';
import { POST as moveOffcuts } from '@/app/api/offcuts/move/route';
import { POST as scrap } from '@/app/api/offcuts/scrap/route';
import { POST as importRack } from '@/app/api/offcuts/import/route';
import { GET as exportRack } from '@/app/api/offcuts/export/route';
import * as schema from '@/db/schema';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

const url = (query: string) => `http://test.local/api/offcuts?${query}`;
const available = async () =>
  t.db.select().from(schema.offcuts).where(eq(schema.offcuts.status, 'available')).orderBy(schema.offcuts.id);

describe('role checks on every offcut endpoint', () => {
  it('reading is for everyone signed in; changes are for the owner and yard hand', async () => {
    const [o] = await available();
    const cases: [string, () => Promise<{ status: number }>, (number | null)[], (number | null)[]][] = [
      ['GET offcuts', () => call(listOffcuts, { url: url('') }), [AS.owner, AS.hand, AS.saw], []],
      ['GET export', () => call(exportRack, { url: url('') }), [AS.owner, AS.hand, AS.saw], []],
      // The saw racks the offcuts it makes, so moving is for everyone signed in.
      [
        'POST move',
        () => call(moveOffcuts, { method: 'POST', body: { ids: [o.id], location: 'Rack C2' } }),
        [AS.owner, AS.hand, AS.saw],
        [],
      ],
      [
        'POST import',
        () =>
          call(importRack, {
            method: 'POST',
            body: { csv: 'section,length,location\nT47100,900,Rack C1\n' },
          }),
        [AS.owner, AS.hand],
        [AS.saw],
      ],
    ];
    for (const [name, run, allowed, refused] of cases) {
      actAs(AS.nobody);
      expect((await run()).status, name).toBe(401);
      for (const who of refused) {
        actAs(who);
        expect((await run()).status, `${name} as ${who}`).toBe(403);
      }
      for (const who of allowed) {
        actAs(who);
        expect((await run()).status, `${name} as ${who}`).toBeLessThan(300);
      }
    }
    actAs(AS.saw);
    expect((await call(scrap, { method: 'POST', body: { ids: [o.id], reason: 'rot' } })).status).toBe(403);
    actAs(AS.nobody);
    expect((await call(scrap, { method: 'POST', body: { ids: [o.id], reason: 'rot' } })).status).toBe(401);
  });
});

describe('GET /api/offcuts', () => {
  it('filters by section, length range and age, sorts and pages', async () => {
    actAs(AS.hand);
    const rack = await available();
    const sectionId = rack[0].sectionId;
    const res = await call(listOffcuts, {
      url: url(
        `sectionId=${sectionId}&minLengthMm=500&maxLengthMm=2000&sort=length&dir=asc&pageSize=5&status=available`,
      ),
    });
    expect(res.status).toBe(200);
    const expected = rack.filter((o) => o.sectionId === sectionId && o.lengthMm >= 500 && o.lengthMm <= 2000);
    expect(res.json.total).toBe(expected.length);
    const lengths = res.json.offcuts.map((o: { lengthMm: number }) => o.lengthMm);
    expect(lengths).toEqual([...lengths].sort((a, b) => a - b));
    expect(lengths.length).toBe(Math.min(5, expected.length));

    const old = await call(listOffcuts, { url: url('minAgeDays=100000') });
    expect(old.json.total).toBe(0);
    const bad = await call(listOffcuts, { url: url('sort=colour') });
    expect(bad.status).toBe(422);
  });
});

describe('changing the rack', () => {
  const movesOf = (ids: number[]) =>
    t.db
      .select()
      .from(schema.stockMovements)
      .where(
        and(inArray(schema.stockMovements.offcutId, ids), eq(schema.stockMovements.kind, 'offcut_moved')),
      );

  it('moves one offcut and records the move', async () => {
    const [o] = await available();
    actAs(AS.hand);
    const res = await call(moveOffcuts, { method: 'POST', body: { ids: [o.id], location: 'Rack C2' } });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ moved: 1, offcuts: [{ id: o.id, tag: o.tag, location: 'Rack C2' }] });
    expect(await movesOf([o.id])).toHaveLength(1);
    const empty = await call(moveOffcuts, { method: 'POST', body: { ids: [o.id], location: '' } });
    expect(empty.status).toBe(422);
    expect((await call(moveOffcuts, { method: 'POST', body: { ids: [], location: 'Rack D' } })).status).toBe(
      422,
    );
  });

  it('moves several offcuts in one go, one movement each; one already there is not moved again', async () => {
    const [a, b, c] = await available();
    await t.db.update(schema.offcuts).set({ location: 'Bay 7' }).where(eq(schema.offcuts.id, c.id));
    actAs(AS.owner);
    const res = await call(moveOffcuts, {
      method: 'POST',
      body: { ids: [a.id, b.id, c.id, a.id], location: 'Bay 7' },
    });
    expect(res.status).toBe(200);
    expect(res.json.moved).toBe(2);
    const rows = await t.db
      .select()
      .from(schema.offcuts)
      .where(inArray(schema.offcuts.id, [a.id, b.id, c.id]));
    expect(rows.map((r) => r.location)).toEqual(['Bay 7', 'Bay 7', 'Bay 7']);
    const moves = await movesOf([a.id, b.id, c.id]);
    expect(moves.map((m) => m.offcutId).sort()).toEqual([a.id, b.id].sort());
    expect(moves.every((m) => m.reason.endsWith('to Bay 7'))).toBe(true);
  });

  it('refuses the whole move when one chosen offcut has left the rack', async () => {
    const [a, b] = await available();
    await t.db.update(schema.offcuts).set({ status: 'scrapped' }).where(eq(schema.offcuts.id, b.id));
    actAs(AS.hand);
    const res = await call(moveOffcuts, { method: 'POST', body: { ids: [a.id, b.id], location: 'Bay 9' } });
    expect(res.status).toBe(409);
    expect(res.json.error).toContain(`${b.tag} is scrapped`);
    const [still] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, a.id));
    expect(still.location).toBe(a.location);
    expect(await movesOf([a.id, b.id])).toHaveLength(0);
    const unknown = await call(moveOffcuts, {
      method: 'POST',
      body: { ids: [a.id, 2_000_000], location: 'Bay 9' },
    });
    expect(unknown.status).toBe(404);
  });

  it('scraps several offcuts with a reason, all or nothing', async () => {
    const [a, b] = await available();
    actAs(AS.owner);
    const res = await call(scrap, { method: 'POST', body: { ids: [a.id, b.id], reason: 'Split ends' } });
    expect(res.status).toBe(200);
    expect(res.json.scrapped).toBe(2);
    const rows = await t.db
      .select()
      .from(schema.offcuts)
      .where(inArray(schema.offcuts.id, [a.id, b.id]));
    expect(rows.map((r) => [r.status, r.scrapReason])).toEqual([
      ['scrapped', 'Split ends'],
      ['scrapped', 'Split ends'],
    ]);
    const [c] = await available();
    const again = await call(scrap, { method: 'POST', body: { ids: [c.id, a.id], reason: 'again' } });
    expect(again.status).toBe(409);
    const [stillThere] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, c.id));
    expect(stillThere.status).toBe('available');
  });

  it('imports a rack CSV all or nothing, listing bad rows by line', async () => {
    actAs(AS.hand);
    const bad = await call(importRack, {
      method: 'POST',
      body: {
        csv: 'section,length,location,tag\nT47100,900,Rack C1,\nNo such timber,abc,Rack C1,\nT47100,1200,Rack C1,K-0001\n',
      },
    });
    expect(bad.status).toBe(422);
    expect(bad.json.details.errors.map((e: { line: number }) => e.line)).toEqual([3, 3]);
    // A tag already on the rack is refused by line too.
    const clash = await call(importRack, {
      method: 'POST',
      body: { csv: 'section,length,location,tag\nT47100,1200,Rack C1,K-0001\n' },
    });
    expect(clash.status).toBe(422);
    expect(clash.json.details.errors).toEqual([
      { line: 2, column: 'tag', message: 'Tag "K-0001" is already on the rack.' },
    ]);
    const good = await call(importRack, {
      method: 'POST',
      body: { csv: 'section,length,location,tag\nT47100,900,Rack C1,\n38x89 CLS,1.2 m,Rack C2,OLD-7\n' },
    });
    expect(good.status).toBe(201);
    expect(good.json.imported).toBe(2);
    expect(good.json.tags[1]).toBe('OLD-7');
  });

  it('tags offcuts imported without a code in the one format, and keeps a yard’s own codes exactly', async () => {
    actAs(AS.hand);
    const highest = Math.max(
      ...(await t.db.select({ tag: schema.offcuts.tag }).from(schema.offcuts)).map((o) =>
        Number(/^K-(\d+)$/.exec(o.tag)?.[1] ?? 0),
      ),
    );
    const res = await call(importRack, {
      method: 'POST',
      body: {
        csv: 'section,length,location,tag\nT47100,900,Rack C1,\nT47100,950,Rack C1,bay3_old-7\nT47100,1000,Rack C1,\n',
      },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(201);
    const next = (n: number) => `K-${String(n).padStart(4, '0')}`;
    expect(res.json.tags).toEqual([next(highest + 1), 'bay3_old-7', next(highest + 2)]);
  });

  it('exports the rack as CSV that the import reads back', async () => {
    actAs(AS.owner);
    const res = await call(exportRack, { url: url('status=available') });
    expect(res.response.headers.get('content-type')).toContain('text/csv');
    const lines = (res.json as string).trim().split(/\r?\n/);
    expect(lines[0]).toBe('section,length,location,tag,status,origin,made');
    expect(lines.length - 1).toBe((await available()).length);
  });
});
