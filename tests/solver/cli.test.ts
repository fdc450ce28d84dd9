import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { SolveInput, SolvePlan } from '@/solver/types';
import { checkPlan } from './plan-checker';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const runCli = (stdin: string) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'solver/cli.ts'], {
    cwd: root,
    input: stdin,
    encoding: 'utf8',
  });

describe('solver CLI', () => {
  it('writes a valid plan for a job on stdin', () => {
    const job: SolveInput = {
      kerf: 3,
      trim: 5,
      minOffcut: 300,
      timeLimitMs: 2000,
      stock: [{ id: 'S4800', length: 4800, cost: 9.6, available: null }],
      offcuts: [{ id: 'K-0042', length: 1250 }],
      pieces: [{ id: 'stud', length: 2100, quantity: 12 }],
    };
    const res = runCli(JSON.stringify(job));
    expect(res.status).toBe(0);
    const plan = JSON.parse(res.stdout) as SolvePlan;
    expect(checkPlan(job, plan)).toEqual([]);
    expect(plan.totals.boards).toBe(6); // two 2100 studs per 4800 board; the 1250 offcut is too short
  });

  it.each([
    ['not JSON', '{oops'],
    ['negative kerf', JSON.stringify({ kerf: -1, pieces: [] })],
    ['missing pieces', JSON.stringify({ kerf: 3, stock: [] })],
    ['fractional length', JSON.stringify({ pieces: [{ id: 'a', length: 10.5, quantity: 1 }] })],
  ])('exits 2 with one line on stderr for %s', (_label, stdin) => {
    const res = runCli(stdin);
    expect(res.status).toBe(2);
    expect(res.stdout).toBe('');
    expect(res.stderr.trim().split('\n')).toHaveLength(1);
  });
});
