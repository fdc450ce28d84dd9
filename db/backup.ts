// Snapshots of the embedded database: a gzip tar of its data folder with a sha256 file beside it.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { realDataDir } from './data-dir-lock';

/**
 * A consistent snapshot of an open database. The checkpoint writes every committed change into the
 * data files; holding PGlite's transaction lock keeps any transaction from being half in it.
 */
export async function takeSnapshot(client: PGlite): Promise<Buffer> {
  await client.query('CHECKPOINT');
  const blob = await client.transaction(() => client.dumpDataDir('gzip'));
  return Buffer.from(await blob.arrayBuffer());
}

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
export const checksumPath = (file: string) => `${file}.sha256`;

/** Writes the snapshot and FILE.sha256 in `sha256sum` format, so `sha256sum -c` checks it too. */
export function writeBackup(file: string, bytes: Buffer): string {
  const digest = sha256(bytes);
  writeFileSync(file, bytes);
  writeFileSync(checksumPath(file), `${digest}  ${path.basename(file)}\n`);
  return digest;
}

/** Reads a backup and throws unless it matches its checksum file. */
export function readVerifiedBackup(file: string): Buffer {
  if (!existsSync(checksumPath(file)))
    throw new Error(`${checksumPath(file)} is missing; cannot check the backup.`);
  const expected = readFileSync(checksumPath(file), 'utf8').trim().split(/\s+/)[0];
  const bytes = readFileSync(file);
  if (sha256(bytes) !== expected)
    throw new Error(`${file} does not match its checksum: it is damaged or incomplete.`);
  return bytes;
}

/** Unpacks a snapshot into an empty data folder (the caller holds the folder's lock). */
export async function restoreSnapshot(dataDir: string, bytes: Buffer): Promise<void> {
  const dir = realDataDir(dataDir);
  if (readdirSync(dir).length > 0)
    throw new Error(`${dir} is not empty. Restore only into an empty data folder.`);
  const client = await PGlite.create(dir, { loadDataDir: new Blob([new Uint8Array(bytes)]) });
  await client.query('select 1');
  await client.close();
}
