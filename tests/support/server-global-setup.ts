// Vitest global setup of the server-mode projects: builds the two template databases once per run
// and drops every per-file database at the end.
import pg from 'pg';
import { openServerDatabase } from '@/db/server-client';
import { seedDemoYard } from '@/lib/demo-yard';
import { DEMO_NOW } from './demo-now';
import { onServer, TEMPLATE_DBS, TEST_DB_PREFIX, urlForDatabase } from './server-template';

async function buildTemplate(serverUrl: string, name: string, seed: boolean) {
  await onServer(serverUrl, [`drop database if exists ${name} with (force)`, `create database ${name}`]);
  const { pool } = await openServerDatabase(urlForDatabase(serverUrl, name), {
    poolSize: 2,
    prepare: seed ? async (db) => void (await seedDemoYard(db, DEMO_NOW)) : undefined,
  });
  await pool.end(); // a template must have no open connections while it is copied
}

// Global setups run in the one main process; the server-mode projects share the templates: the
// first setup builds them, and the last teardown drops the per-file databases.
const USERS = 'KERFWISE_TEST_SERVER_TEMPLATE_USERS';

export default async function setup() {
  const serverUrl = process.env.KERFWISE_TEST_DATABASE_URL;
  if (!serverUrl) throw new Error('The server-mode project needs KERFWISE_TEST_DATABASE_URL.');
  const users = Number(process.env[USERS] ?? 0);
  if (users === 0) {
    await buildTemplate(serverUrl, TEMPLATE_DBS.migrated, false);
    await buildTemplate(serverUrl, TEMPLATE_DBS.demo, true);
  }
  process.env[USERS] = String(users + 1);
  return async () => {
    const left = Number(process.env[USERS]) - 1;
    process.env[USERS] = String(left);
    if (left === 0) {
      delete process.env[USERS];
      await dropTestDatabases(serverUrl);
    }
  };
}

async function dropTestDatabases(serverUrl: string) {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ datname: string }>(
      'select datname from pg_database where starts_with(datname, $1)',
      [TEST_DB_PREFIX],
    );
    for (const { datname } of rows) await client.query(`drop database if exists ${datname} with (force)`);
  } finally {
    await client.end();
  }
}
