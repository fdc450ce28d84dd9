// The one database client of the server process, opened lazily so `next build` never touches it.
import 'server-only';
import { dataDirPath } from '@/lib/env';
import { openDatabase, type Db } from './client';

export type { Db, DbOrTx, Tx } from './client';

type Cache = { kerfwiseDb?: Promise<Db> };
const cache = globalThis as unknown as Cache;

export function getDb(): Promise<Db> {
  // Cached on globalThis: hot reloads would otherwise open a second PGlite on the same folder.
  cache.kerfwiseDb ??= openDatabase(dataDirPath()).then(
    ({ db }) => db,
    (error: unknown) => {
      cache.kerfwiseDb = undefined; // let the next request try again
      throw error;
    },
  );
  return cache.kerfwiseDb;
}

/** Tests point the server code at an in-memory database. */
export function setDbForTests(db: Db | undefined): void {
  cache.kerfwiseDb = db ? Promise.resolve(db) : undefined;
}
