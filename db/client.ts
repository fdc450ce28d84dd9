// Opens the embedded Postgres (PGlite) through Drizzle, migrated and seeded, once per process.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import * as schema from './schema';
import { acquireDataDirLock } from './data-dir-lock';
import { seedDemoYard } from './seed';

import type { Db } from './types';

export type { Db, DbOrTx, Tx } from './types';

export const migrationsFolder = path.resolve(/*turbopackIgnore: true*/ process.cwd(), 'drizzle');

export function wrapClient(client: PGlite): Db {
  return drizzle({ client, schema });
}

/** Applies the migrations folder to an embedded database. */
export async function migrateEmbedded(client: PGlite): Promise<void> {
  await migrate(drizzle({ client, schema }), { migrationsFolder });
}

/** Opens a data folder (or memory when dir is null), applies migrations and seeds an empty yard. */
export async function openDatabase(dir: string | null, options: { seed?: boolean } = {}) {
  if (dir) {
    mkdirSync(path.dirname(dir), { recursive: true });
    acquireDataDirLock(dir);
  }
  const client = dir ? new PGlite(dir) : new PGlite();
  const db = wrapClient(client);
  await migrateEmbedded(client);
  if (options.seed ?? true) await seedDemoYard(db);
  return { client, db };
}
