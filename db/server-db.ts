// The one database of the server process: opened at start-up (instrumentation.ts) or on first use,
// and cached on globalThis so hot reloads and separate bundles share one database and one lock.
// This is the one module that chooses the driver: a PostgreSQL server when DATABASE_URL is set,
// embedded PGlite otherwise. Nothing else knows which one is in use.
import type { PGlite } from '@electric-sql/pglite';
import { openDatabase } from './client';
import { dataDirPath, databaseEnv } from './env';
import { openServerDatabase } from './server-client';
import type { Db } from './types';

/** `client` is the embedded database (for backups), or null on a PostgreSQL server. */
export type ServerDb = { db: Db; client: PGlite | null };
/** What a freshly opened database gets before first use (the demo yard, the first owner). */
export type PrepareDatabase = (db: Db) => Promise<void>;
type Cache = { kerfwiseDb?: Promise<ServerDb>; kerfwisePrepareDb?: PrepareDatabase };
const cache = globalThis as unknown as Cache;

/**
 * Start-up code names the preparation before the first open (lib/server/start-up.ts, the worker), so
 * the database layer needs nothing from the app. Without one the database is only migrated.
 */
export function setDatabasePreparation(prepare: PrepareDatabase): void {
  cache.kerfwisePrepareDb = prepare;
}

async function open(): Promise<ServerDb> {
  const env = databaseEnv();
  const prepare: PrepareDatabase = (db) => cache.kerfwisePrepareDb?.(db) ?? Promise.resolve();
  if (env.DATABASE_URL) {
    const { db } = await openServerDatabase(env.DATABASE_URL, {
      prepare,
      poolSize: env.KERFWISE_DB_POOL_SIZE,
    });
    return { db, client: null };
  }
  const { db, client } = await openDatabase(dataDirPath());
  await prepare(db);
  return { db, client };
}

export function getServerDb(): Promise<ServerDb> {
  // A build that opened the folder would leave its lock behind for the server started after it.
  if (process.env.NEXT_PHASE === 'phase-production-build') {
    return Promise.reject(
      new Error('The database is not opened while building: render this page per request.'),
    );
  }
  cache.kerfwiseDb ??= open().catch((error: unknown) => {
    cache.kerfwiseDb = undefined; // let the next request try again
    throw error;
  });
  return cache.kerfwiseDb;
}

/** Tests point the server code at an in-memory database. */
export function setServerDbForTests(db: Db | undefined): void {
  cache.kerfwiseDb = db ? Promise.resolve({ db, client: null }) : undefined;
}
