import { afterAll, describe, expect, it } from 'vitest';
import { runSolver, solverPoolStats, stopSolverThreads, warmSolverThreads } from '@/lib/plans/run-solver';
import type { SolveInput } from '@/solver';

/** Many distinct lengths keep the search busy until its time limit. */
function longJob(timeLimitMs: number): SolveInput {
  const pieces = Array.from({ length: 180 }, (_, i) => ({
    id: `p${i}`,
    length: 301 + ((i * 7919) % 2400),
    quantity: 3,
  }));
  return {
    kerf: 3,
    trim: 5,
    minOffcut: 300,
    timeLimitMs,
    stock: [3000, 3600, 4200, 4800, 5400, 6000].map((length) => ({ id: `s${length}`, length })),
    offcuts: [],
    pieces,
  };
}

describe('runSolver', () => {
  afterAll(() => stopSolverThreads());

  it('solves in a worker thread, so this thread keeps answering during a long solve', async () => {
    await runSolver(longJob(200)); // a warm thread, so only the solve itself is measured
    let longestGapMs = 0;
    let last = performance.now();
    const ticker = setInterval(() => {
      const now = performance.now();
      longestGapMs = Math.max(longestGapMs, now - last);
      last = now;
    }, 10);
    const started = performance.now();
    const plan = await runSolver(longJob(1_500));
    clearInterval(ticker);

    expect(performance.now() - started).toBeGreaterThan(1_000); // the solve really was long
    expect(plan.unplaced).toEqual([]);
    expect(plan.boards.flatMap((b) => b.pieces)).toHaveLength(540);
    // On the request thread the ticker would have stalled for the whole solve.
    expect(longestGapMs).toBeLessThan(200);
  });

  it('passes a failure inside the worker back as a rejection, not a hang', async () => {
    await expect(runSolver({ ...longJob(200), pieces: null as never })).rejects.toThrow();
  });

  it('keeps its warm thread for the next plan instead of starting a new one', async () => {
    await runSolver(longJob(200)); // the pool has a ready thread from here on
    const before = solverPoolStats().started;
    const first = await runSolver(longJob(200));
    const second = await runSolver(longJob(200));
    expect(first.unplaced).toEqual([]);
    expect(second.unplaced).toEqual([]);
    expect(solverPoolStats().started).toBe(before);
    expect(solverPoolStats().alive).toBeGreaterThanOrEqual(1);
  });

  it('warms its threads ahead of the first plan, and the plan uses one of them', async () => {
    await stopSolverThreads();
    const before = solverPoolStats().started;
    warmSolverThreads();
    warmSolverThreads(); // a second call starts no more
    expect(solverPoolStats().alive).toBe(2);
    expect(solverPoolStats().started).toBe(before + 2);
    const plan = await runSolver(longJob(200));
    expect(plan.boards.flatMap((b) => b.pieces)).toHaveLength(540);
    expect(solverPoolStats().started).toBe(before + 2);
  });

  it('says clearly when the thread dies mid-solve, and the next solve starts a fresh one', async () => {
    await runSolver(longJob(200));
    const before = solverPoolStats().started;
    const dying = runSolver(longJob(5_000));
    const outcome = dying.then(
      () => null,
      (error: Error) => error,
    );
    await new Promise((r) => setTimeout(r, 300)); // the job is on the thread by now
    await stopSolverThreads();
    const error = await outcome;
    expect(error?.message).toMatch(/cutting engine stopped unexpectedly/);
    expect(solverPoolStats().alive).toBe(0);

    const next = await runSolver(longJob(200));
    expect(next.boards.flatMap((b) => b.pieces)).toHaveLength(540);
    expect(solverPoolStats().started).toBe(before + 1);
  });
});
