// `npm run db:reset`: wipes the data folder and seeds the demo yard again.
// Refuses while a server holds the folder: two processes on one folder lose data.
import { rmSync } from 'node:fs';
import { openDatabase } from '../db/client';
import { dataDirHolder } from '../db/data-dir-lock';
import { dataDirPath } from '../lib/env';

const dir = dataDirPath();
const holder = dataDirHolder(dir);
if (holder !== null) {
  console.error(
    `Kerfwise: ${dir} is open in process ${holder}. Stop the server first, then run db:reset again.`,
  );
  process.exit(1);
}
rmSync(dir, { recursive: true, force: true });
const { client } = await openDatabase(dir);
await client.close();
console.log(`Kerfwise: ${dir} wiped, migrated and seeded with the demo yard.`);
