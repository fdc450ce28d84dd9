// Server-mode test databases: one migrated, demo-seeded template database on the test PostgreSQL
// server, copied with CREATE DATABASE … TEMPLATE for every test (much faster than migrating again).
import pg from 'pg';

export const TEMPLATE_DB = 'kerfwise_test_template';
export const SEED_DATE = new Date('2026-11-20T09:00:00Z');

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
