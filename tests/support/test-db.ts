// Databases for tests. Each test file opens one database from a run-wide starting point (the demo
// yard, or an empty migrated database plus the suite's own minimal fixture) and every test gets it
// back with the rows reset, which is much faster than opening or cloning a database per test.
// Embedded: an in-memory PGlite from a snapshot. Server-mode project (KERFWISE_TEST_SERVER=1): a
// database on the test PostgreSQL server, copied from a template database.
// Projects that run many files in one process (KERFWISE_TEST_REUSE_DB=1, see vitest.config.ts) keep
// a file's databases for the next file of that process, with the rows put back as they were at the
// start: opening a database costs seconds on this machine, putting its rows back milliseconds.
import { setDbForTests } from '@/db';
import { wrapClient, type Db } from '@/db/client';
import { connectServer } from '@/db/server-client';
import { openSnapshot } from './snapshots';
import { serverTestUrl, onServer, TEMPLATE_DBS, TEST_DB_PREFIX, urlForDatabase } from './server-template';
import { saveRows, type SavedRows, type SqlClient } from './table-reset';

export type { SqlClient };

/** Builds a suite's own rows on an empty migrated database (through lib functions where they exist). */
export type Fixture = (db: Db) => Promise<void>;

interface OpenedDb {
  db: Db;
  client: SqlClient;
  /** The server database's address (server mode only), for processes the test starts. */
  url?: string;
  end: () => Promise<void>;
}

type Start = 'demo' | 'migrated';

/** An opened database and how to put it back to its starting point (kept only when reused). */
interface StartedDb extends OpenedDb {
  start: Start;
  pristine: SavedRows | null;
}

interface SuiteDb extends StartedDb {
  saved: SavedRows;
  inUse: boolean;
}

const suites = new Map<Fixture | 'demo', Promise<SuiteDb>>();
let serverDbCount = 0;

const reuseAcrossFiles = process.env.KERFWISE_TEST_REUSE_DB === '1';
// On globalThis: the one list of the process, whatever becomes of this module between files.
const idle = ((globalThis as unknown as { kerfwiseIdleTestDbs?: StartedDb[] }).kerfwiseIdleTestDbs ??= []);

async function openEmbedded(start: Start): Promise<OpenedDb> {
  const client = await openSnapshot(start);
  return { db: wrapClient(client), client, end: () => client.close() };
}

async function openOnServer(serverUrl: string, start: Start): Promise<OpenedDb> {
  const name = `${TEST_DB_PREFIX}${process.pid}_${++serverDbCount}`;
  await onServer(serverUrl, [`create database ${name} template ${TEMPLATE_DBS[start]} strategy file_copy`]);
  const url = urlForDatabase(serverUrl, name);
  const { pool, db } = connectServer(url, 4);
  const client: SqlClient = {
    query: async <T>(text: string, params?: unknown[]) => ({
      rows: (await pool.query(text, params)).rows as T[],
    }),
    exec: (text: string) => pool.query(text),
  };
  // The database itself is dropped with the rest when the run ends (see server-global-setup.ts).
  return { db, client, url, end: () => pool.end() };
}

/** A database at its starting point: an earlier file's, with its rows put back, or a new one. */
async function startDb(start: Start): Promise<StartedDb> {
  const kept = idle.findIndex((d) => d.start === start);
  if (kept !== -1) {
    const [reused] = idle.splice(kept, 1);
    await reused.pristine!.restore();
    return reused;
  }
  const serverUrl = serverTestUrl();
  const opened = serverUrl ? await openOnServer(serverUrl, start) : await openEmbedded(start);
  const pristine = reuseAcrossFiles ? await saveRows(opened.client, 'test_start_rows') : null;
  return { ...opened, start, pristine };
}

async function openSuiteDb(fixture: Fixture | 'demo'): Promise<SuiteDb> {
  const started = await startDb(fixture === 'demo' ? 'demo' : 'migrated');
  if (fixture !== 'demo') {
    setDbForTests(started.db); // lib functions reach the database through getDb()
    try {
      await fixture(started.db);
    } finally {
      setDbForTests(undefined);
    }
  }
  // The demo yard's starting rows are already set aside when the database is kept for reuse.
  const saved = fixture === 'demo' && started.pristine ? started.pristine : await saveRows(started.client);
  return { ...started, saved, inUse: false };
}

export interface TestDb {
  db: Db;
  client: SqlClient;
  /** The server database's address (server mode only), for processes the test starts. */
  url?: string;
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
    url: suite.url,
    close: async () => {
      await suite.saved.restore();
      suite.inUse = false;
    },
  };
}

/**
 * Closes the file's databases (call in afterAll, or Vitest will not exit), or keeps them for the
 * next file of the process when databases are reused.
 */
export async function closeTemplate(): Promise<void> {
  const open = [...suites.values()];
  suites.clear();
  for (const suite of open) {
    const { start, db, client, url, end, pristine } = await suite;
    if (reuseAcrossFiles) idle.push({ start, db, client, url, end, pristine });
    else await end();
  }
}
