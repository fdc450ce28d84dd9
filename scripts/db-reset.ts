// `npm run db:reset`: wipes the data folder and seeds the demo yard again.
// Takes the folder's lock first, so it is refused while a server holds the folder.
import { readdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { openDatabase } from '../db/client';
import { acquireDataDirLock, realDataDir } from '../db/data-dir-lock';
import { seedDemoYard } from '../db/seed';
import { dataDirPath } from '../db/env';

const dir = dataDirPath();
try {
  acquireDataDirLock(dir);
} catch (error) {
  console.error(`Kerfwise: ${(error as Error).message} Then run db:reset again.`);
  process.exit(1);
}
// Empty the folder rather than remove it: a symlinked folder stays a symlink.
const real = realDataDir(dir);
for (const entry of readdirSync(real)) rmSync(path.join(real, entry), { recursive: true, force: true });
const { db, client, release } = await openDatabase(dir);
await seedDemoYard(db);
await client.close();
release();
console.log(`Kerfwise: ${dir} wiped, migrated and seeded with the demo yard.`);
