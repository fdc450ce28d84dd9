// Runs the cutting engine off the request's event loop, in a worker thread, with a hard deadline.
import 'server-only';
import { Worker } from 'node:worker_threads';
import { prepareSolver, solve, type SolveInput, type SolvePlan } from '@/solver';
import { AppError } from '@/lib/errors';

const GRACE_MS = 5_000; // the solver stops itself at timeLimitMs; this only catches a stuck worker

function solveInWorker(input: SolveInput): Promise<SolvePlan> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./solver-worker.ts', import.meta.url));
    const timer = setTimeout(() => {
      void worker.terminate();
      reject(new AppError('unavailable', 'The cutting engine took too long. Try again with fewer pieces.'));
    }, input.timeLimitMs + GRACE_MS);
    worker.once('message', (reply: { ok: true; plan: SolvePlan } | { ok: false; message: string }) => {
      clearTimeout(timer);
      void worker.terminate();
      if (reply.ok) resolve(reply.plan);
      else reject(new Error(reply.message));
    });
    worker.once('error', (error) => {
      clearTimeout(timer);
      reject(error);
    });
    worker.postMessage(input);
  });
}

/** Under the bundler the worker file is compiled; under the test runner (plain .ts) solve in process. */
export async function runSolver(input: SolveInput): Promise<SolvePlan> {
  if (import.meta.url.endsWith('.ts')) {
    await prepareSolver().catch(() => undefined);
    return solve(input);
  }
  return solveInWorker(input);
}
