// Two PGlite instances on one folder silently lose rows, so one process owns a data folder at a time.
// The lock file sits beside the folder (not inside it) and names the owner's pid.
import { existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';

export function lockFilePath(dataDir: string): string {
  return `${dataDir.replace(/[\\/]+$/, '')}.lock`;
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Returns the pid holding the folder, or null when it is free (a stale lock counts as free). */
export function dataDirHolder(dataDir: string): number | null {
  const file = lockFilePath(dataDir);
  if (!existsSync(file)) return null;
  const pid = Number(readFileSync(file, 'utf8').trim());
  if (!Number.isInteger(pid) || pid <= 0 || !isAlive(pid)) return null;
  return pid;
}

export function acquireDataDirLock(dataDir: string): void {
  const holder = dataDirHolder(dataDir);
  if (holder !== null && holder !== process.pid) {
    throw new Error(
      `The Kerfwise data folder ${dataDir} is already open in process ${holder}. ` +
        'Stop that server first: two processes on one folder lose data.',
    );
  }
  const file = lockFilePath(dataDir);
  writeFileSync(file, String(process.pid));
  const release = () => {
    try {
      if (readFileSync(file, 'utf8').trim() === String(process.pid)) rmSync(file);
    } catch {
      // already gone
    }
  };
  // A lock left by a killed process names a dead pid and counts as free, so no signal handlers are needed.
  process.once('exit', release);
}
