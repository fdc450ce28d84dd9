// `npm run setup:owner -- EMAIL [NAME]`: creates the first owner of a yard with no accounts.
// The password comes from KERFWISE_OWNER_PASSWORD or is asked for (kept out of the shell history).
// Embedded, it takes the data folder's lock, so run it with the server stopped; with DATABASE_URL it
// connects to the PostgreSQL server (servers may be running). Or set KERFWISE_OWNER_EMAIL and
// KERFWISE_OWNER_PASSWORD for the server, which creates the owner itself at start.
import { createInterface } from 'node:readline/promises';
import { openDatabase } from '../db/client';
import { createFirstOwner } from '../lib/users/first-owner';
import { openServerDatabase } from '../db/server-client';
import type { Db } from '../db/types';
import { dataDirPath } from '../db/env';
import { getEnv } from '../lib/env';

/** The yard's database, whichever kind, and how to let go of it. */
async function open(): Promise<{ db: Db; close: () => Promise<void> }> {
  const url = getEnv().DATABASE_URL;
  if (url) {
    const { db, pool } = await openServerDatabase(url, { poolSize: 1 });
    return { db, close: () => pool.end() };
  }
  const { db, client, release } = await openDatabase(dataDirPath());
  return { db, close: async () => (await client.close(), release()) };
}

async function askPassword(): Promise<string> {
  const rl = createInterface({ input: process.stdin, output: process.stdout, terminal: true });
  const answer = await rl.question('Password for the first owner (at least 8 characters): ');
  rl.close();
  return answer;
}

const env = getEnv();
const [emailArg, nameArg] = process.argv.slice(2);
const email = emailArg ?? env.KERFWISE_OWNER_EMAIL;
if (!email) {
  console.error('Usage: npm run setup:owner -- owner@your-yard.example [Name]');
  process.exit(1);
}
let opened;
try {
  opened = await open();
} catch (error) {
  console.error(`Kerfwise: ${(error as Error).message}`);
  process.exit(1);
}
try {
  const password = env.KERFWISE_OWNER_PASSWORD ?? (await askPassword());
  const result = await createFirstOwner(opened.db, {
    email,
    password,
    name: nameArg ?? env.KERFWISE_OWNER_NAME,
  });
  if (result.created)
    console.log(`Kerfwise: created the owner ${result.email}. Start the server and sign in.`);
  else console.log(`Kerfwise: no owner created: ${result.reason}. Add people on the Users page.`);
} catch (error) {
  console.error(`Kerfwise: ${(error as Error).message}`);
  process.exitCode = 1;
} finally {
  await opened.close();
}
