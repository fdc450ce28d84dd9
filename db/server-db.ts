// The one database of the server process: opened at start-up (instrumentation.ts) or on first use,
// and cached on globalThis so hot reloads and separate bundles share one PGlite and one lock.
import type { PGlite } from '@electric-sql/pglite';
import { dataDirPath, getEnv } from '@/lib/env';
import { openDatabase, type Db } from './client';
import { prepareYard } from './prepare-yard';

export type ServerDb = { db: Db; client: PGlite | null };
type Cache = { kerfwiseDb?: Promise<ServerDb> };
const cache = globalThis as unknown as Cache;

export function getServerDb(): Promise<ServerDb> {
  // A build that opened the folder would leave its lock behind for the server started after it.
  if (process.env.NEXT_PHASE === 'phase-production-build') {
    return Promise.reject(
      new Error('The database is not opened while building: render this page per request.'),
    );
  }
  cache.kerfwiseDb ??= openDatabase(dataDirPath()).then(
    async ({ db, client }) => {
      await prepareYard(db, getEnv());
      return { db, client };
    },
    (error: unknown) => {
      cache.kerfwiseDb = undefined; // let the next request try again
      throw error;
    },
  );
  return cache.kerfwiseDb;
}

/** Tests point the server code at an in-memory database. */
export function setServerDbForTests(db: Db | undefined): void {
  cache.kerfwiseDb = db ? Promise.resolve({ db, client: null }) : undefined;
}
