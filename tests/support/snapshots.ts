// Database snapshots shared by every test file of one run. The first file that asks for a snapshot
// builds it (others wait for the file), so a run that needs no database builds nothing.
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { inject } from 'vitest';
import { migrationsFolder, wrapClient } from '@/db/client';
import { seedDemoYard } from '@/lib/demo-yard';

import { DEMO_NOW } from './demo-now';

export { DEMO_NOW };

const builders = {
  /** All migrations applied, no rows: the base of a suite's own minimal fixture. */
  migrated: async () => {
    const client = new PGlite();
    await migrate(wrapClient(client), { migrationsFolder });
    return client;
  },
  /** The whole demo yard with its solver-planned history, for the suites that need it. */
  demo: async () => {
    const client = new PGlite();
    const db = wrapClient(client);
    await migrate(db, { migrationsFolder });
    await seedDemoYard(db, DEMO_NOW);
    return client;
  },
} satisfies Record<string, () => Promise<PGlite>>;
export type SnapshotName = keyof typeof builders;

const WAIT_MS = 240_000;

async function waitForFile(file: string): Promise<void> {
  const started = Date.now();
  while (!existsSync(file)) {
    if (existsSync(`${file}.failed`)) throw new Error(readFileSync(`${file}.failed`, 'utf8'));
    if (Date.now() - started > WAIT_MS) throw new Error(`Timed out waiting for the test snapshot ${file}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** Builds the named snapshot file unless it exists; returns the built database to its builder. */
async function buildOrWait(name: SnapshotName): Promise<{ file: string; built?: PGlite }> {
  const file = path.join(inject('snapshotDir'), `${name}.tar`);
  if (existsSync(file)) return { file };
  try {
    mkdirSync(`${file}.lock`); // atomic: exactly one test file builds each snapshot
  } catch {
    await waitForFile(file);
    return { file };
  }
  try {
    const built = await builders[name]();
    const dump = await built.dumpDataDir('none');
    writeFileSync(`${file}.tmp`, Buffer.from(await dump.arrayBuffer()));
    renameSync(`${file}.tmp`, file); // readers never see half a file
    return { file, built };
  } catch (error) {
    writeFileSync(`${file}.failed`, `Building the ${name} test snapshot failed: ${String(error)}`);
    throw error;
  }
}

/** A new in-memory database holding the named snapshot. Close it when done. */
export async function openSnapshot(name: SnapshotName): Promise<PGlite> {
  const { file, built } = await buildOrWait(name);
  // The builder keeps the database it built: loading it again would cost another start-up.
  return built ?? new PGlite({ loadDataDir: new Blob([readFileSync(file)]) });
}
