// The one database client of the server process, opened lazily so `next build` never touches it.
// This is the one module that chooses the driver: a PostgreSQL server when DATABASE_URL is set,
// embedded PGlite otherwise. Nothing else knows which one is in use.
import 'server-only';
import { databaseUrl, dataDirPath, demoSeedRequested, getEnv } from '@/lib/env';
import { openDatabase } from './client';
import { openServerDatabase } from './server-client';
import type { Db } from './types';

export type { Db, DbOrTx, Tx } from './types';

type Cache = { kerfwiseDb?: Promise<Db> };
const cache = globalThis as unknown as Cache;

async function open(): Promise<Db> {
  const url = databaseUrl();
  if (url) {
    const env = getEnv();
    const { db } = await openServerDatabase(url, {
      seed: demoSeedRequested(),
      poolSize: env.KERFWISE_DB_POOL_SIZE,
    });
    return db;
  }
  const { db } = await openDatabase(dataDirPath());
  return db;
}

export function getDb(): Promise<Db> {
  // Cached on globalThis: hot reloads would otherwise open a second database (and, embedded, a
  // second PGlite on the same folder).
  cache.kerfwiseDb ??= open().catch((error: unknown) => {
    cache.kerfwiseDb = undefined; // let the next request try again
    throw error;
  });
  return cache.kerfwiseDb;
}

/** Tests point the server code at an in-memory database. */
export function setDbForTests(db: Db | undefined): void {
  cache.kerfwiseDb = db ? Promise.resolve(db) : undefined;
}
