// `npm run setup:owner -- EMAIL [NAME]`: creates the first owner of a yard with no accounts.
// The password comes from KERFWISE_OWNER_PASSWORD or is asked for (kept out of the shell history).
// Takes the data folder's lock, so run it with the server stopped; or set KERFWISE_OWNER_EMAIL and
// KERFWISE_OWNER_PASSWORD for the server, which creates the owner itself at start.
import { createInterface } from 'node:readline/promises';
import { openDatabase } from '../db/client';
import { createFirstOwner } from '../db/first-owner';
import { dataDirPath, getEnv } from '../lib/env';

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
  opened = await openDatabase(dataDirPath());
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
  await opened.client.close();
  opened.release();
}
