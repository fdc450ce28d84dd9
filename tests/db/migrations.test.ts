// A yard's database made by an earlier set of migrations must upgrade to the current one with its
// rows intact: migrations are appended (drizzle-kit generate), never regenerated.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setDbForTests } from '@/db';
import { migrationsFolder, wrapClient } from '@/db/client';
import { formatPence } from '@/lib/format/money';
import { getPlanById } from '@/lib/plans/get-plan';

interface Journal {
  entries: { idx: number; tag: string }[];
}
const journal = JSON.parse(
  readFileSync(path.join(migrationsFolder, 'meta/_journal.json'), 'utf8'),
) as Journal;
const scratch = mkdtempSync(path.join(tmpdir(), 'kerfwise-migrations-'));
let client: PGlite;
let oldPlanClient: PGlite;
afterAll(async () => {
  setDbForTests(undefined);
  await client?.close();
  await oldPlanClient?.close();
  rmSync(scratch, { recursive: true, force: true });
});

/** A copy of the migrations folder that knows only the first `count` migrations. */
function firstMigrations(count: number): string {
  const dir = path.join(scratch, `first-${count}`);
  cpSync(migrationsFolder, dir, { recursive: true });
  const partial: Journal = { ...journal, entries: journal.entries.slice(0, count) };
  writeFileSync(path.join(dir, 'meta/_journal.json'), JSON.stringify(partial));
  return dir;
}

// Rows written in the columns of the initial migration, which later migrations must keep.
const initialRows = `
  insert into users (email, name, role, password_hash) values ('owner@upgrade.test', 'Owner', 'owner', 'x');
  insert into yard_settings (id, yard_name, kerf_mm) values (1, 'Upgrade yard', 4);
  insert into sections (code, name, thickness_mm, width_mm) values ('U47X100', '47 x 100', 47, 100);
  insert into stock_lengths (section_id, length_mm, price_pence, on_hand) values (1, 4800, 960, 12);
  insert into offcuts (tag, section_id, length_mm, location) values ('U-0001', 1, 1250, 'Rack A1');
  insert into jobs (reference, customer_name, status) values ('J-UP-1', 'Upgrade customer', 'draft');
  insert into job_items (job_id, section_id, length_mm, quantity) values (1, 1, 2100, 6);
`;

async function count(db: PGlite, table: string): Promise<number> {
  const { rows } = await db.query<{ n: number }>(`select count(*)::int as n from ${table}`);
  return rows[0].n;
}

describe('database upgrades', () => {
  it('the journal starts with the initial migration, kept as it was', () => {
    expect(journal.entries[0].tag).toBe('0000_init');
    expect(journal.entries.map((e) => e.idx)).toEqual(journal.entries.map((_, i) => i));
  });

  // Set up in a hook: starting PGlite can outlast a test's time limit on a busy machine.
  beforeAll(async () => {
    client = new PGlite();
    await migrate(wrapClient(client), { migrationsFolder: firstMigrations(1) });
    await client.exec(initialRows);
  });

  it('a database made by the initial migration upgrades to all of them with its rows intact', async () => {
    await migrate(wrapClient(client), { migrationsFolder });
    const applied = await client.query<{ n: number }>(
      'select count(*)::int as n from drizzle.__drizzle_migrations',
    );
    expect(applied.rows[0].n).toBe(journal.entries.length);
    for (const table of [
      'users',
      'yard_settings',
      'sections',
      'stock_lengths',
      'offcuts',
      'jobs',
      'job_items',
    ]) {
      expect(await count(client, table), table).toBe(1);
    }
    const { rows } = await client.query<{ email: string; tag: string; reference: string; kerf: number }>(
      `select u.email, o.tag, j.reference, y.kerf_mm as kerf
         from users u, offcuts o, jobs j, yard_settings y`,
    );
    expect(rows).toEqual([{ email: 'owner@upgrade.test', tag: 'U-0001', reference: 'J-UP-1', kerf: 4 }]);
  });
});

// A plan saved before the plan-json-words migration, as the code of that time stored it: the plan's kerf
// loss under totals.kerfMm and its price in pounds. The prices are invented; the pounds are the
// pence of the pricing test's worked example (tests/pricing/price-cutting-plan.test.ts) divided by 100.
const oldTotals = {
  boards: 4,
  stockBoards: 3,
  offcutsUsed: 1,
  materialMm: 14450,
  pieceMm: 13200,
  kerfMm: 18,
  scrapMm: 432,
  keptMm: 800,
  keptOffcuts: 1,
  yieldPercent: 96.7,
  stockCostPence: 2645,
  cuts: 6,
  lowerBoundBoards: 4,
  gapBoards: 0,
  unplacedPieces: 0,
  baseline: { boards: 4, stockCostPence: 3365, scrapMm: 1700 },
};
const oldPrice = {
  lines: [
    {
      description: '47 x 100, 4800 mm stock length',
      quantity: 2,
      unit: 'board',
      unitPrice: 9.6,
      amount: 19.2,
    },
    {
      description: '47 x 100, 3600 mm stock length',
      quantity: 1,
      unit: 'board',
      unitPrice: 7.25,
      amount: 7.25,
    },
    { description: 'Cutting to length', quantity: 6, unit: 'cut', unitPrice: 0.35, amount: 2.1 },
  ],
  materials: 26.45,
  cutting: 2.1,
  total: 28.55,
};

describe('saved plans in the shape before the plan-json-words migration', () => {
  // Found by name, so the test still holds if the migration is renumbered when branches merge.
  const before = journal.entries.findIndex((e) => e.tag.endsWith('_plan-json-words'));

  beforeAll(async () => {
    oldPlanClient = new PGlite();
    await migrate(wrapClient(oldPlanClient), { migrationsFolder: firstMigrations(before) });
    await oldPlanClient.exec(initialRows);
    await oldPlanClient.query(
      `insert into plans (job_id, status, settings, sections, totals, price_pence, price)
       values (1, 'planned', $1, '[]', $2, 2855, $3)`,
      [
        JSON.stringify({
          kerfMm: 3,
          trimMm: 5,
          minOffcutMm: 300,
          useOffcuts: true,
          stockLengthIds: null,
          timeLimitMs: 2000,
        }),
        JSON.stringify(oldTotals),
        JSON.stringify(oldPrice),
      ],
    );
    // A plan stored without a price (the demo history's plans) must come through untouched.
    await oldPlanClient.query(
      `insert into plans (job_id, status, settings, sections, totals, price_pence)
       values (1, 'superseded', '{}', '[]', $1, 2855)`,
      [JSON.stringify(oldTotals)],
    );
  });

  it('come out with the kerf loss and the price in whole pence under their new names, and the app reads them', async () => {
    expect(before).toBeGreaterThan(0);
    await migrate(wrapClient(oldPlanClient), { migrationsFolder });
    const { rows } = await oldPlanClient.query<{ totals: Record<string, unknown>; price: unknown }>(
      'select totals, price from plans order by id',
    );
    for (const { totals } of rows) {
      expect(totals).not.toHaveProperty('kerfMm');
      const { kerfMm, ...rest } = oldTotals;
      expect(totals).toEqual({ ...rest, kerfLossMm: kerfMm });
    }
    expect(rows[0].price).toEqual({
      lines: [
        {
          description: '47 x 100, 4800 mm stock length',
          quantity: 2,
          unit: 'board',
          unitPence: 960,
          amountPence: 1920,
        },
        {
          description: '47 x 100, 3600 mm stock length',
          quantity: 1,
          unit: 'board',
          unitPence: 725,
          amountPence: 725,
        },
        { description: 'Cutting to length', quantity: 6, unit: 'cut', unitPence: 35, amountPence: 210 },
      ],
      materialsPence: 2645,
      cuttingPence: 210,
      totalPence: 2855,
    });
    expect(rows[1].price).toBeNull();

    setDbForTests(wrapClient(oldPlanClient));
    const plan = await getPlanById({ planId: 1 });
    expect(plan.totals.kerfLossMm).toBe(18);
    expect(plan.settings.kerfMm).toBe(3);
    expect(plan.price?.totalPence).toBe(plan.pricePence);
    expect(formatPence(plan.price!.totalPence)).toBe('£28.55');
    expect(plan.price!.lines.map((l) => formatPence(l.amountPence))).toEqual(['£19.20', '£7.25', '£2.10']);
  });
});
