import { spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';
import { existsSync, mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '@/db/client';
import { acquireDataDirLock, dataDirHolder, lockFilePath } from '@/db/data-dir-lock';
import { jobs } from '@/db/schema';

const root = mkdtempSync(path.join(tmpdir(), 'kerfwise-lock-'));
const DEAD_PID = '999999999';

type Child = { child: ChildProcess; lines: string[]; waiters: (() => void)[] };

/** Starts `count` lock-test processes and waits until every one has loaded and said "ready". */
async function startChildren(count: number, args: string[]): Promise<Child[]> {
  const children = Array.from({ length: count }, () => {
    const c: Child = {
      child: spawn('node_modules/.bin/tsx', ['tests/db/lock-child.ts', ...args], {
        stdio: ['pipe', 'pipe', 'inherit'],
      }),
      lines: [],
      waiters: [],
    };
    createInterface({ input: c.child.stdout! }).on('line', (line) => {
      c.lines.push(line);
      c.waiters.splice(0).forEach((wake) => wake());
    });
    return c;
  });
  await Promise.all(children.map((c) => lineMatching(c, (l) => l === 'ready')));
  return children;
}

/** Resolves with the first line (already printed or still to come) that passes `test`. */
function lineMatching(c: Child, test: (line: string) => boolean): Promise<string> {
  return new Promise((resolve) => {
    const look = () => {
      const found = c.lines.find(test);
      if (found !== undefined) resolve(found);
      else c.waiters.push(look);
    };
    look();
  });
}

describe('data folder lock', () => {
  it('refuses a folder held by another live process', () => {
    const dir = path.join(root, 'held');
    writeFileSync(lockFilePath(dir), String(process.ppid));
    expect(dataDirHolder(dir)).toBe(process.ppid);
    expect(() => acquireDataDirLock(dir)).toThrow(/already open/);
  });

  it('takes over a lock left by a dead process', () => {
    const dir = path.join(root, 'stale');
    writeFileSync(lockFilePath(dir), DEAD_PID);
    expect(dataDirHolder(dir)).toBeNull();
    const release = acquireDataDirLock(dir);
    expect(dataDirHolder(dir)).toBe(process.pid);
    release();
    expect(dataDirHolder(dir)).toBeNull();
  });

  it('takes over a lock whose process exited but was never reaped (a zombie)', async () => {
    // The shell starts a short-lived child, then becomes `sleep`, which never reaps it: for a few
    // seconds the child's pid answers kill(pid, 0) although the process is gone.
    const parent = spawn('sh', ['-c', 'sleep 0 & echo $!; exec sleep 5'], {
      stdio: ['ignore', 'pipe', 'ignore'],
    });
    const [chunk] = (await once(parent.stdout, 'data')) as [Buffer];
    const zombiePid = Number(String(chunk).trim());
    await new Promise((resolve) => setTimeout(resolve, 300)); // let `sleep 0` exit
    try {
      expect(() => process.kill(zombiePid, 0)).not.toThrow();
      const dir = path.join(root, 'zombie');
      writeFileSync(lockFilePath(dir), String(zombiePid));
      expect(dataDirHolder(dir)).toBeNull();
      acquireDataDirLock(dir)();
    } finally {
      parent.kill();
    }
  });

  it('keys the lock on the real folder, so a symlinked path shares it', () => {
    const dir = path.join(root, 'real');
    mkdirSync(dir);
    const link = path.join(root, 'link');
    symlinkSync(dir, link);
    expect(lockFilePath(link)).toBe(lockFilePath(dir));
    writeFileSync(lockFilePath(dir), String(process.ppid));
    expect(() => acquireDataDirLock(link)).toThrow(/already open/);
  });

  // Three processes race for a fresh folder at one instant, six times (odd rounds also race to
  // reclaim a stale lock). The same three serve every round: each keeps what it won, in folders the
  // later rounds never touch, so every round is a race between three live processes.
  it('lets exactly one of several processes racing together take the folder, 6 rounds of 3', async () => {
    const children = await startChildren(3, ['lock']);
    try {
      const winners: number[] = [];
      for (let round = 0; round < 6; round++) {
        const dir = path.join(root, `race-${round}`);
        if (round % 2) writeFileSync(lockFilePath(dir), DEAD_PID);
        for (const c of children) c.child.stdin!.write(`go ${dir}\n`);
        const outputs = await Promise.all(
          children.map((c) =>
            lineMatching(c, (l) => l.startsWith(`won ${dir}`) || l.startsWith(`refused ${dir} `)),
          ),
        );
        winners.push(outputs.filter((o) => o.startsWith('won')).length);
        expect(outputs.filter((o) => o.startsWith('refused'))).toHaveLength(2);
      }
      expect(winners).toEqual(Array(6).fill(1));
    } finally {
      for (const c of children) c.child.stdin!.end();
      await Promise.all(children.map((c) => (c.child.exitCode === null ? once(c.child, 'close') : null)));
    }
  }, 300_000);

  it('loses nothing acknowledged when two processes open one database together', async () => {
    const dir = path.join(root, 'db');
    const children = await startChildren(2, ['write', dir]);
    for (const c of children) c.child.stdin!.write('go\n');
    await Promise.all(children.map((c) => once(c.child, 'close')));
    const outputs = children.map((c) => c.lines.filter((l) => l !== 'ready').join('\n'));
    const acked = outputs.flatMap((o) => [...o.matchAll(/^ack (\S+)$/gm)].map((m) => m[1]));
    expect(outputs.filter((o) => o.startsWith('refused'))).toHaveLength(1);
    expect(acked).toHaveLength(10);
    const { db, client, release } = await openDatabase(dir);
    const stored = (await db.select({ reference: jobs.reference }).from(jobs)).map((j) => j.reference);
    await client.close();
    release();
    expect(stored.sort()).toEqual(acked.sort());
    expect(existsSync(lockFilePath(dir))).toBe(false); // released on close
  }, 300_000);
});
