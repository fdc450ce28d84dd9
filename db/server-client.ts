// Opens a PostgreSQL server through node-postgres with a pool. Several app instances and workers may
// start together, so migrations (and the yard's preparation, when asked for) run under an advisory lock.
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Pool } from 'pg';
import { migrationsFolder } from './client';
import * as schema from './schema';
import type { Db } from './types';

/** Any fixed number that no other program on the same database uses as an advisory lock. */
const MIGRATION_LOCK_KEY = 5_183_201;

/** Runs after the migrations, still under the lock: the demo seed or the first owner. */
type Prepare = (db: Db) => Promise<void>;

export async function migrateServer(pool: Pool, prepare?: Prepare): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    const db = drizzle({ client, schema });
    await migrate(db, { migrationsFolder });
    if (prepare) await prepare(db);
  } finally {
    await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => undefined);
    client.release();
  }
}

export function connectServer(url: string, poolSize: number): { pool: Pool; db: Db } {
  const pool = new Pool({ connectionString: url, max: poolSize });
  // An idle client losing its connection (server restart) must not crash the process.
  pool.on('error', (error) => console.error('PostgreSQL pool error', error));
  return { pool, db: drizzle({ client: pool, schema }) };
}

/** Connects, migrates (once across instances) and prepares the yard when asked. */
export async function openServerDatabase(
  url: string,
  options: { prepare?: Prepare; poolSize?: number } = {},
) {
  const { pool, db } = connectServer(url, options.poolSize ?? 10);
  try {
    await migrateServer(pool, options.prepare);
  } catch (error) {
    await pool.end();
    throw error;
  }
  return { pool, db };
}
