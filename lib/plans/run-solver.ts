// Runs the cutting engine off the request's event loop, in a worker thread, with a hard deadline.
import 'server-only';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { SolveInput, SolvePlan } from '@/solver';
import { AppError } from '@/lib/errors';

/** Loading the solver into a fresh thread; generous because a busy machine can be slow to start one. */
const START_LIMIT_MS = 30_000;
/**
 * The solver stops itself at timeLimitMs; this only catches a stuck worker. Generous, because on a
 * busy machine a cold thread's first integer model (HiGHS compiling as it runs) can overrun by seconds.
 */
const GRACE_MS = 15_000;

/**
 * The worker file is found from the project folder, not from import.meta.url: under the bundler
 * import.meta.url names the source file, which says nothing about where the server runs from.
 */
export const solverWorkerPath = path.resolve(
  /*turbopackIgnore: true*/ process.cwd(),
  'lib/plans/solver-worker.mjs',
);

type WorkerReply = { ready: true } | { ok: true; plan: SolvePlan } | { ok: false; message: string };

const tooLong = () =>
  new AppError('unavailable', 'The cutting engine took too long. Try again with fewer pieces.');

/** Solves one input in a fresh worker thread; the worker is ended at the deadline whatever it is doing. */
export function runSolver(input: SolveInput): Promise<SolvePlan> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(solverWorkerPath);
    let timer = setTimeout(() => stop(tooLong()), START_LIMIT_MS);
    const stop = (error: Error | null, plan?: SolvePlan) => {
      clearTimeout(timer);
      void worker.terminate();
      if (error) reject(error);
      else resolve(plan!);
    };
    worker.on('message', (reply: WorkerReply) => {
      if ('ready' in reply) {
        clearTimeout(timer);
        timer = setTimeout(() => stop(tooLong()), input.timeLimitMs + GRACE_MS);
        worker.postMessage(input);
      } else if (reply.ok) stop(null, reply.plan);
      else stop(new Error(reply.message));
    });
    worker.once('error', (error) => stop(error));
    worker.once('exit', (code) =>
      stop(new Error(`The cutting engine stopped unexpectedly (exit code ${code}).`)),
    );
  });
}
