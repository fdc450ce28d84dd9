// Server-mode test databases: template databases on the test PostgreSQL server (built once per run
// by server-global-setup.ts), copied with CREATE DATABASE … TEMPLATE for each test file.
import pg from 'pg';

/** The same two starting points as the embedded snapshots (see snapshots.ts). */
export const TEMPLATE_DBS = { migrated: 'kerfwise_test_migrated', demo: 'kerfwise_test_demo' } as const;
/** Prefix of the per-file databases, all dropped at the end of the run. */
export const TEST_DB_PREFIX = 'kerfwise_test_file_';

/** The server URL when this is the server-mode project (KERFWISE_TEST_SERVER=1), else null. */
export function serverTestUrl(): string | null {
  return process.env.KERFWISE_TEST_SERVER === '1' ? (process.env.KERFWISE_TEST_DATABASE_URL ?? null) : null;
}

/** The same server URL with another database name. */
export function urlForDatabase(serverUrl: string, database: string): string {
  const url = new URL(serverUrl);
  url.pathname = `/${database}`;
  return url.toString();
}

/** Runs statements on the server's maintenance database (CREATE/DROP DATABASE cannot run in a transaction). */
export async function onServer(serverUrl: string, statements: string[]): Promise<void> {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    for (const statement of statements) await client.query(statement);
  } finally {
    await client.end();
  }
}
