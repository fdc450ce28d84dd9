// A yard's database made by an earlier set of migrations must upgrade to the current one with its
// rows intact: migrations are appended (drizzle-kit generate), never regenerated.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrationsFolder, wrapClient } from '@/db/client';

interface Journal {
  entries: { idx: number; tag: string }[];
}
const journal = JSON.parse(
  readFileSync(path.join(migrationsFolder, 'meta/_journal.json'), 'utf8'),
) as Journal;
const scratch = mkdtempSync(path.join(tmpdir(), 'kerfwise-migrations-'));
let client: PGlite;
afterAll(async () => {
  await client?.close();
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
