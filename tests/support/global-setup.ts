// One temporary folder per Vitest run for database snapshots: the first test file that needs a
// snapshot builds it there (see snapshots.ts), every later file loads it, and the folder goes at the end.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    snapshotDir: string;
  }
}

export default function setup(project: TestProject) {
  const dir = mkdtempSync(path.join(tmpdir(), 'kerfwise-test-snapshots-'));
  project.provide('snapshotDir', dir);
  return () => rmSync(dir, { recursive: true, force: true });
}
