// The one database of the server process: opened at start-up (instrumentation.ts) or on first use,
// and cached on globalThis so hot reloads and separate bundles share one database and one lock.
// This is the one module that chooses the driver: a PostgreSQL server when DATABASE_URL is set,
// embedded PGlite otherwise. Nothing else knows which one is in use.
import type { PGlite } from '@electric-sql/pglite';
import { dataDirPath, getEnv } from '@/lib/env';
import { openDatabase } from './client';
import { prepareYard } from './prepare-yard';
import { openServerDatabase } from './server-client';
import type { Db } from './types';

/** `client` is the embedded database (for backups), or null on a PostgreSQL server. */
export type ServerDb = { db: Db; client: PGlite | null };
type Cache = { kerfwiseDb?: Promise<ServerDb> };
const cache = globalThis as unknown as Cache;

async function open(): Promise<ServerDb> {
  const env = getEnv();
  if (env.DATABASE_URL) {
    const { db } = await openServerDatabase(env.DATABASE_URL, {
      prepare: (db) => prepareYard(db, env),
      poolSize: env.KERFWISE_DB_POOL_SIZE,
    });
    return { db, client: null };
  }
  const { db, client } = await openDatabase(dataDirPath());
  await prepareYard(db, env);
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
