// `npm run db:restore -- FILE`: restores a backup into an empty data folder, with the server stopped.
// Checks FILE against FILE.sha256 first and takes the folder's lock, so a running server refuses it.
import { readVerifiedBackup, restoreSnapshot } from '../db/backup';
import { openDatabase } from '../db/client';
import { acquireDataDirLock } from '../db/data-dir-lock';
import { databaseUrl, dataDirPath } from '../db/env';

if (databaseUrl()) {
  console.error(
    'Kerfwise: DATABASE_URL is set: use pg_restore on the PostgreSQL server (see docs/deploy.md).',
  );
  process.exit(1);
}
const file = process.argv[2];
if (!file) {
  console.error('Usage: npm run db:restore -- FILE   (into an empty KERFWISE_DATA_DIR, server stopped)');
  process.exit(1);
}
const dir = dataDirPath();
try {
  const bytes = readVerifiedBackup(file);
  const release = acquireDataDirLock(dir);
  await restoreSnapshot(dir, bytes);
  // Brings an older backup up to this version's schema.
  const { client } = await openDatabase(dir);
  await client.close();
  release();
  console.log(`Kerfwise: restored ${file} into ${dir}. Start the server.`);
} catch (error) {
  console.error(`Kerfwise: restore failed: ${(error as Error).message}`);
  process.exit(1);
}
