// In-memory databases for tests: migrate and seed one template, then clone it per test.
import { PGlite } from '@electric-sql/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { migrationsFolder, wrapClient, type Db } from '@/db/client';
import { seedDemoYard } from '@/db/seed';

let template: PGlite | undefined;

async function getTemplate(): Promise<PGlite> {
  if (!template) {
    const client = new PGlite();
    const db = wrapClient(client);
    await migrate(db, { migrationsFolder });
    await seedDemoYard(db, new Date('2026-11-20T09:00:00Z'));
    template = client;
  }
  return template;
}

/** A fresh, migrated and demo-seeded in-memory database. Close it when done. */
export async function createTestDb(): Promise<{ db: Db; client: PGlite; close: () => Promise<void> }> {
  // clone() copies the migrated, seeded template in a fraction of the time a fresh migrate takes.
  const client = (await (await getTemplate()).clone()) as PGlite;
  return { db: wrapClient(client), client, close: () => client.close() };
}

export async function closeTemplate(): Promise<void> {
  await template?.close();
  template = undefined;
}
