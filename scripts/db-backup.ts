// `npm run db:backup -- FILE`: writes a consistent snapshot of the data folder to FILE and its
// checksum to FILE.sha256. While a server runs it holds the folder, so the snapshot is asked of the
// server over its private backup socket; with no server, the folder is opened here under its lock.
import { openDatabase } from '../db/client';
import { takeSnapshot, writeBackup } from '../db/backup';
import { requestSnapshot } from '../db/backup-socket';
import { dataDirHolder } from '../db/data-dir-lock';
import { databaseUrl, dataDirPath } from '../db/env';

if (databaseUrl()) {
  console.error('Kerfwise: DATABASE_URL is set: use pg_dump on the PostgreSQL server (see docs/deploy.md).');
  process.exit(1);
}
const file = process.argv[2];
if (!file) {
  console.error('Usage: npm run db:backup -- FILE   (e.g. backups/kerfwise-2026-12-02.tar.gz)');
  process.exit(1);
}
const dir = dataDirPath();

async function snapshot(): Promise<Buffer> {
  if (dataDirHolder(dir) !== null) return requestSnapshot(dir);
  const { client, release } = await openDatabase(dir);
  try {
    return await takeSnapshot(client);
  } finally {
    await client.close();
    release();
  }
}

try {
  const bytes = await snapshot();
  const digest = writeBackup(file, bytes);
  console.log(`Kerfwise: wrote ${file} (${bytes.length} bytes, sha256 ${digest}) and ${file}.sha256.`);
} catch (error) {
  console.error(`Kerfwise: backup failed: ${(error as Error).message}`);
  process.exit(1);
}
