import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { acquireDataDirLock, dataDirHolder, lockFilePath } from '@/db/data-dir-lock';

const root = mkdtempSync(path.join(tmpdir(), 'kerfwise-lock-'));

describe('data folder lock', () => {
  it('refuses a folder held by another live process', () => {
    const dir = path.join(root, 'held');
    writeFileSync(lockFilePath(dir), String(process.ppid));
    expect(dataDirHolder(dir)).toBe(process.ppid);
    expect(() => acquireDataDirLock(dir)).toThrow(/already open/);
  });

  it('takes over a lock left by a dead process', () => {
    const dir = path.join(root, 'stale');
    writeFileSync(lockFilePath(dir), '999999999');
    expect(dataDirHolder(dir)).toBeNull();
    acquireDataDirLock(dir);
    expect(dataDirHolder(dir)).toBe(process.pid);
  });
});
