// Vitest global setup of the server project: builds the template database once per run.
import pg from 'pg';
import { openServerDatabase } from '@/db/server-client';
import { seedDemoYard } from '@/db/seed';
import { onServer, SEED_DATE, TEMPLATE_DB, urlForDatabase } from './server-template';

export default async function setup() {
  const serverUrl = process.env.KERFWISE_TEST_DATABASE_URL;
  if (!serverUrl) throw new Error('The server project needs KERFWISE_TEST_DATABASE_URL.');
  await onServer(serverUrl, [
    `drop database if exists ${TEMPLATE_DB} with (force)`,
    `create database ${TEMPLATE_DB}`,
  ]);
  const { pool, db } = await openServerDatabase(urlForDatabase(serverUrl, TEMPLATE_DB), { poolSize: 2 });
  await seedDemoYard(db, SEED_DATE);
  await pool.end(); // a template must have no open connections while it is copied
  return () => dropTestDatabases(serverUrl);
}

/** Drops every per-test database at the end of the run (dropping one per test doubles the cost). */
async function dropTestDatabases(serverUrl: string) {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ datname: string }>(
      "select datname from pg_database where datname like 'kerfwise\\_test\\_%'",
    );
    for (const { datname } of rows) await client.query(`drop database if exists ${datname} with (force)`);
  } finally {
    await client.end();
  }
}
