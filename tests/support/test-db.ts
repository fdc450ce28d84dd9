// Test databases: an in-memory PGlite cloned from a migrated, seeded template, or (in the server
// project, KERFWISE_TEST_SERVER=1) a fresh database on the test PostgreSQL server copied from its template.
import { PGlite } from '@electric-sql/pglite';
import { migrateEmbedded, wrapClient, type Db } from '@/db/client';
import { connectServer } from '@/db/server-client';
import { seedDemoYard } from '@/db/seed';
import { onServer, SEED_DATE, TEMPLATE_DB, urlForDatabase } from './server-template';

/** Raw SQL for checks that are easier to state in SQL than in Drizzle. */
export type SqlClient = { query<T>(text: string, params?: unknown[]): Promise<{ rows: T[] }> };
/** url: the server database's address (server mode only), for processes the test starts. */
export type TestDb = { db: Db; client: SqlClient; close: () => Promise<void>; url?: string };

let template: PGlite | undefined;
let serverDbCount = 0;

export function serverTestUrl(): string | null {
  return process.env.KERFWISE_TEST_SERVER === '1' ? (process.env.KERFWISE_TEST_DATABASE_URL ?? null) : null;
}

async function getTemplate(): Promise<PGlite> {
  if (!template) {
    const client = new PGlite();
    await migrateEmbedded(client);
    await seedDemoYard(wrapClient(client), SEED_DATE);
    template = client;
  }
  return template;
}

async function createServerTestDb(serverUrl: string): Promise<TestDb> {
  const name = `kerfwise_test_${process.pid}_${++serverDbCount}`;
  await onServer(serverUrl, [`create database ${name} template ${TEMPLATE_DB} strategy file_copy`]);
  const url = urlForDatabase(serverUrl, name);
  const { pool, db } = connectServer(url, 4);
  const client: SqlClient = {
    query: async <T>(text: string, params?: unknown[]) => ({
      rows: (await pool.query(text, params)).rows as T[],
    }),
  };
  // The database itself is dropped with the rest when the run ends (see server-global-setup.ts).
  return { db, client, close: () => pool.end(), url };
}

/** A fresh, migrated and demo-seeded database. Close it when done. */
export async function createTestDb(): Promise<TestDb> {
  const serverUrl = serverTestUrl();
  if (serverUrl) return createServerTestDb(serverUrl);
  // clone() copies the migrated, seeded template in a fraction of the time a fresh migrate takes.
  const client = (await (await getTemplate()).clone()) as PGlite;
  return { db: wrapClient(client), client, close: () => client.close() };
}

export async function closeTemplate(): Promise<void> {
  await template?.close();
  template = undefined;
}
