// The running server owns the data folder, so backups are asked of it over a Unix socket in the OS
// temp folder, named from the folder's real path. Not beside the folder: that is often inside the
// project, where the CSS build's file scan would try to read the socket and fail. The socket file is private to the server's OS user (mode 0600): only that user (or root),
// who could read the data folder anyway, can ask; nothing listens on the network.
import { createHash } from 'node:crypto';
import { chmodSync, rmSync } from 'node:fs';
import net from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { PGlite } from '@electric-sql/pglite';
import { takeSnapshot } from './backup';
import { realDataDir } from './data-dir-lock';

/** Short (Unix socket paths are limited to about 108 bytes) and the same for every path to one folder. */
export const backupSocketPath = (dataDir: string) =>
  path.join(
    tmpdir(),
    `kerfwise-backup-${createHash('sha256').update(realDataDir(dataDir)).digest('hex').slice(0, 16)}.sock`,
  );

/** Answers each connection with one snapshot: a JSON header line, then the gzip bytes. */
export function serveBackups(dataDir: string, client: PGlite): Promise<net.Server> {
  const file = backupSocketPath(dataDir);
  rmSync(file, { force: true }); // the caller holds the folder's lock, so an old socket is stale
  const server = net.createServer((socket) => {
    takeSnapshot(client).then(
      (bytes) =>
        socket.end(Buffer.concat([Buffer.from(`${JSON.stringify({ bytes: bytes.length })}\n`), bytes])),
      (error: unknown) => socket.end(`${JSON.stringify({ error: String(error) })}\n`),
    );
  });
  server.unref();
  process.once('exit', () => rmSync(file, { force: true }));
  return new Promise((resolve, reject) => {
    const umask = process.umask(0o177); // the socket is created private, with no moment of being open
    server.once('error', (error) => {
      process.umask(umask);
      reject(error);
    });
    server.listen(file, () => {
      process.umask(umask);
      chmodSync(file, 0o600);
      resolve(server);
    });
  });
}

/** Asks the server holding dataDir for a snapshot. */
export function requestSnapshot(dataDir: string): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    const socket = net.connect(backupSocketPath(dataDir));
    socket.on('data', (chunk: Buffer) => chunks.push(chunk));
    socket.on('error', reject);
    socket.on('end', () => {
      const all = Buffer.concat(chunks);
      const newline = all.indexOf(10);
      const header = JSON.parse(all.subarray(0, newline).toString('utf8')) as {
        bytes?: number;
        error?: string;
      };
      const bytes = all.subarray(newline + 1);
      if (header.error) reject(new Error(`The server could not take a snapshot: ${header.error}`));
      else if (bytes.length !== header.bytes) reject(new Error('The snapshot arrived incomplete.'));
      else resolve(bytes);
    });
  });
}
