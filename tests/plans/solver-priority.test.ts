// Solver threads yield the CPU to the server's own thread: only the solver thread runs at the lower
// priority, the thread answering requests keeps its own.
import { readdirSync, readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { runSolver, stopSolverThreads } from '@/lib/plans/run-solver';

process.env.KERFWISE_SOLVER_NICE = '7'; // read when the pool starts its first thread, below

/** A thread's nice value: field 19 of its stat file (proc(5)). */
function niceOf(statPath: string): number {
  const stat = readFileSync(statPath, 'utf8');
  // The command name in field 2 may hold spaces; the fields after its closing bracket start at 3.
  return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[19 - 3]);
}
const threadNiceValues = () =>
  readdirSync('/proc/self/task').map((tid) => niceOf(`/proc/self/task/${tid}/stat`));

describe.skipIf(process.platform !== 'linux')('solver thread priority', () => {
  afterAll(() => stopSolverThreads());

  it('runs the solver thread at the configured priority and leaves this thread at its own', async () => {
    const own = niceOf('/proc/thread-self/stat');
    const plan = await runSolver({
      kerf: 3,
      trim: 5,
      minOffcut: 300,
      timeLimitMs: 500,
      stock: [{ id: 's4800', length: 4800 }],
      offcuts: [],
      pieces: [{ id: 'p', length: 2100, quantity: 4 }],
    });
    expect(plan.boards.length).toBe(2);
    const nice = threadNiceValues();
    expect(nice).toContain(Math.max(own, 7));
    expect(readFileSync('/proc/thread-self/stat', 'utf8').split(') ')[1].split(' ')[19 - 3]).toBe(
      String(own),
    );
  });
});
