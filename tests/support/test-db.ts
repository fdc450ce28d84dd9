// In-memory databases for tests. Each test file opens one PGlite from a run-wide snapshot (the demo
// yard, or an empty migrated database plus the suite's own minimal fixture) and every test gets it
// back with the rows reset, which is much faster than opening or cloning a database per test.
import type { PGlite } from '@electric-sql/pglite';
import { setDbForTests } from '@/db';
import { wrapClient, type Db } from '@/db/client';
import { openSnapshot } from './snapshots';
import { saveRows, type SavedRows } from './table-reset';

/** Builds a suite's own rows on an empty migrated database (through lib functions where they exist). */
export type Fixture = (db: Db) => Promise<void>;

interface SuiteDb {
  db: Db;
  client: PGlite;
  saved: SavedRows;
  inUse: boolean;
}

const suites = new Map<Fixture | 'demo', Promise<SuiteDb>>();

async function openSuiteDb(fixture: Fixture | 'demo'): Promise<SuiteDb> {
  const client = await openSnapshot(fixture === 'demo' ? 'demo' : 'migrated');
  const db = wrapClient(client);
  if (fixture !== 'demo') {
    setDbForTests(db); // lib functions reach the database through getDb()
    try {
      await fixture(db);
    } finally {
      setDbForTests(undefined);
    }
  }
  return { db, client, saved: await saveRows(client), inUse: false };
}

export interface TestDb {
  db: Db;
  client: PGlite;
  /** Gives the database back: its rows are reset for the next test. */
  close: () => Promise<void>;
}

/**
 * The test file's database: the demo yard by default, or the given minimal fixture.
 * One at a time per fixture: close it before asking again.
 */
export async function createTestDb({
  fixture = 'demo',
}: { fixture?: Fixture | 'demo' } = {}): Promise<TestDb> {
  if (!suites.has(fixture)) suites.set(fixture, openSuiteDb(fixture));
  const suite = await suites.get(fixture)!;
  if (suite.inUse) throw new Error('The test database is still open: close it before asking for it again.');
  suite.inUse = true;
  return {
    db: suite.db,
    client: suite.client,
    close: async () => {
      await suite.saved.restore();
      suite.inUse = false;
    },
  };
}

/** Closes the file's databases (call in afterAll, or Vitest will not exit). */
export async function closeTemplate(): Promise<void> {
  const open = [...suites.values()];
  suites.clear();
  for (const suite of open) await (await suite).client.close();
}
