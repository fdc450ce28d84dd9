// Two PGlite instances on one folder silently lose rows, so one process owns a data folder at a time.
// The lock file sits beside the folder's real path (a symlinked path shares it), is created
// atomically with O_EXCL, names the owner's pid, and is reclaimed once that process is dead.
import {
  closeSync,
  mkdirSync,
  openSync,
  readFileSync,
  realpathSync,
  rmSync,
  statSync,
  writeSync,
} from 'node:fs';

/** A lock file still empty this long after it was made belongs to a process that died making it. */
const HALF_WRITTEN_MS = 10_000;

/** Creates the folder if needed and returns its real path, with every symlink resolved. */
export function realDataDir(dataDir: string): string {
  mkdirSync(dataDir, { recursive: true });
  return realpathSync(dataDir);
}

export function lockFilePath(dataDir: string): string {
  return `${realDataDir(dataDir)}.lock`;
}

/**
 * A process that exited but was never reaped (a zombie, common in containers whose first process
 * does not reap orphans) still answers kill(pid, 0), yet holds nothing: Linux's /proc says 'Z'.
 */
function isZombie(pid: number): boolean {
  const stat = readRaw(`/proc/${pid}/stat`);
  if (!stat) return false;
  // The state follows the command name, which is in parentheses and may itself hold spaces.
  return stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3) === 'Z';
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
  return !isZombie(pid);
}

function readRaw(file: string): string | null {
  try {
    return readFileSync(file, 'utf8');
  } catch {
    return null;
  }
}

function ageMs(file: string): number {
  try {
    return Date.now() - statSync(file).mtimeMs;
  } catch {
    return 0;
  }
}

/**
 * 'free' (no file), the live owner's pid, 'writing' (just made, pid not written yet) or 'stale'
 * (dead owner, or a file its maker never finished).
 */
function lockState(file: string): 'free' | 'writing' | 'stale' | number {
  const raw = readRaw(file);
  if (raw === null) return 'free';
  if (!raw.trim()) return ageMs(file) > HALF_WRITTEN_MS ? 'stale' : 'writing';
  const pid = Number(raw.trim());
  if (!Number.isInteger(pid) || pid <= 0) return 'stale';
  return isAlive(pid) ? pid : 'stale';
}

/** Returns the live pid holding the folder, or null when it is free (a stale lock counts as free). */
export function dataDirHolder(dataDir: string): number | null {
  const state = lockState(lockFilePath(dataDir));
  return typeof state === 'number' ? state : null;
}

/**
 * Removes a stale lock. A second O_EXCL file guards the check-and-remove, so two processes that both
 * saw the same stale lock cannot remove each other's fresh one.
 */
function reclaimStale(file: string, staleRaw: string | null): void {
  const guard = `${file}.reclaim`;
  let fd: number;
  try {
    fd = openSync(guard, 'wx');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    // Someone else is reclaiming; a guard left this long belongs to a process that died doing it.
    if (ageMs(guard) > HALF_WRITTEN_MS) rmSync(guard, { force: true });
    return;
  }
  try {
    if (readRaw(file) === staleRaw && lockState(file) === 'stale') rmSync(file, { force: true });
  } finally {
    closeSync(fd);
    rmSync(guard, { force: true });
  }
}

const pause = (ms: number) => Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, ms);

/** Releases the lock if this process still holds it. */
export type ReleaseLock = () => void;

/**
 * Takes the folder for this process or throws with who holds it. Taking it again in the same
 * process is allowed (a dev server's hot reload). The lock is released when the process exits.
 */
export function acquireDataDirLock(dataDir: string): ReleaseLock {
  const file = lockFilePath(dataDir);
  const release = () => {
    if (readRaw(file)?.trim() === String(process.pid)) rmSync(file, { force: true });
  };
  for (let attempt = 0; attempt < 50; attempt++) {
    try {
      const fd = openSync(file, 'wx');
      writeSync(fd, `${process.pid}\n`);
      closeSync(fd);
      // A killed process leaves a lock naming a dead pid, which the next start reclaims.
      process.once('exit', release);
      return release;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
    const raw = readRaw(file);
    const state = lockState(file);
    if (state === process.pid) return release;
    if (typeof state === 'number') {
      throw new Error(
        `The Kerfwise data folder ${realDataDir(dataDir)} is already open in process ${state}. ` +
          'Stop that server first: two processes on one folder lose data.',
      );
    }
    if (state === 'stale') reclaimStale(file, raw);
    else pause(20); // being written by its maker, or just reclaimed: look again shortly
  }
  throw new Error(`Could not take the lock ${file}; another process keeps taking it.`);
}
