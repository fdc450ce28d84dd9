// Opens the embedded Postgres (PGlite) through Drizzle, migrated, once per process.
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle, type PgliteDatabase } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import * as schema from './schema';
import { acquireDataDirLock, realDataDir } from './data-dir-lock';

export type { Db, DbOrTx, Tx } from './types';
/** The embedded database with PGlite's own result types (backups and tests use them). */
export type EmbeddedDb = PgliteDatabase<typeof schema>;

export const migrationsFolder = path.resolve(/*turbopackIgnore: true*/ process.cwd(), 'drizzle');

export function wrapClient(client: PGlite): EmbeddedDb {
  return drizzle({ client, schema });
}

/** Applies the migrations folder to an embedded database. */
export async function migrateEmbedded(client: PGlite): Promise<void> {
  await migrate(drizzle({ client, schema }), { migrationsFolder });
}

/**
 * Opens a data folder (or memory when dir is null) and applies migrations. The folder's lock is
 * taken first and held until the process exits (or `release` is called after `client.close()`).
 * Seeding is separate (db/prepare-yard.ts): production starts with no users.
 */
export async function openDatabase(dir: string | null) {
  const release = dir ? acquireDataDirLock(dir) : () => {};
  const client = dir ? new PGlite(realDataDir(dir)) : new PGlite();
  const db = wrapClient(client);
  await migrateEmbedded(client);
  return { client, db, release };
}
