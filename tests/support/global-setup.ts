// One temporary folder per Vitest run for database snapshots, shared by the projects that use it:
// the first test file that needs a snapshot builds it there (see snapshots.ts), every later file
// loads it, and the folder goes when the last project using it is done.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    snapshotDir: string;
  }
}

// Global setups run in the one main process: its environment holds the run's folder and users.
const RUN_DIR = 'KERFWISE_TEST_SNAPSHOT_RUN_DIR';
const USERS = 'KERFWISE_TEST_SNAPSHOT_RUN_USERS';

export default function setup(project: TestProject) {
  process.env[RUN_DIR] ??= mkdtempSync(path.join(tmpdir(), 'kerfwise-test-snapshots-'));
  const dir = process.env[RUN_DIR];
  process.env[USERS] = String(Number(process.env[USERS] ?? 0) + 1);
  project.provide('snapshotDir', dir);
  return () => {
    const users = Number(process.env[USERS]) - 1;
    process.env[USERS] = String(users);
    if (users > 0) return;
    rmSync(dir, { recursive: true, force: true });
    delete process.env[RUN_DIR];
    delete process.env[USERS];
  };
}
