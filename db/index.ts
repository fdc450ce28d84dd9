// The one database client of the server process, opened at start-up so `next build` never touches it.
import 'server-only';
import { getServerDb, setServerDbForTests } from './server-db';
import type { Db } from './types';

export type { Db, DbOrTx, Tx } from './types';

export async function getDb(): Promise<Db> {
  return (await getServerDb()).db;
}

/** Tests point the server code at an in-memory database. */
export const setDbForTests = setServerDbForTests;
