// Runs the cutting engine off the request's event loop, in a small pool of long-lived worker threads
// (loaded once per server process and warmed while idle), with a hard deadline per solve. A thread that
// crashes, or is stopped at its deadline, is dropped; the next solve starts a fresh one.
import 'server-only';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { SolveInput, SolvePlan } from '@/solver';
import { getEnv } from '@/lib/env';
import { AppError } from '@/lib/errors';

/** Threads per server process: two solves at once on a small server; more wait their turn. */
const POOL_SIZE = 2;
/** Loading and warming the solver in a fresh thread; generous because a busy machine is slow to start one. */
const START_LIMIT_MS = 30_000;
/**
 * The solver stops itself at timeLimitMs; this only catches a stuck thread. Generous, because a busy
 * machine can hold a solve back by seconds.
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

interface Job {
  input: SolveInput;
  resolve: (plan: SolvePlan) => void;
  reject: (error: Error) => void;
}

interface SolverThread {
  worker: Worker;
  ready: boolean;
  job: Job | null;
  timer: ReturnType<typeof setTimeout> | null;
}

interface Pool {
  threads: SolverThread[];
  waiting: Job[];
  /** Threads started since the process began: tests read it to see that threads are reused. */
  started: number;
}

// Kept on globalThis so a module reloaded in development does not start a second pool.
const globalPool = globalThis as unknown as { __kerfwiseSolverPool?: Pool };
const pool: Pool = (globalPool.__kerfwiseSolverPool ??= { threads: [], waiting: [], started: 0 });

const tooLong = () =>
  new AppError('unavailable', 'The cutting engine took too long. Try again with fewer pieces.');
const stoppedUnexpectedly = (code: number) =>
  new AppError(
    'unavailable',
    `The cutting engine stopped unexpectedly (exit code ${code}). Plan the job again; it starts afresh.`,
  );

/** Solves one input on a warm thread of the pool; rejects if the thread fails or overruns its deadline. */
export function runSolver(input: SolveInput): Promise<SolvePlan> {
  return new Promise((resolve, reject) => {
    pool.waiting.push({ input, resolve, reject });
    dispatch();
  });
}

/**
 * Starts the pool's threads ahead of the first plan, so the first yard hand of the day does not wait for
 * the engine to load. Idle threads do not keep the process alive.
 */
export function warmSolverThreads(): void {
  while (pool.threads.length < POOL_SIZE) startThread();
}

/** How many solver threads this process has started, and how many are alive now. */
export function solverPoolStats(): { started: number; alive: number } {
  return { started: pool.started, alive: pool.threads.length };
}

/** Ends every solver thread (shutdown, tests); a solve in progress is rejected. */
export async function stopSolverThreads(): Promise<void> {
  await Promise.all(pool.threads.map((t) => t.worker.terminate()));
}

function dispatch(): void {
  while (pool.waiting.length > 0) {
    const idle = pool.threads.find((t) => t.ready && !t.job);
    if (idle) {
      give(idle, pool.waiting.shift()!);
      continue;
    }
    const starting = pool.threads.filter((t) => !t.ready).length;
    if (pool.threads.length >= POOL_SIZE || starting >= pool.waiting.length) return;
    startThread();
  }
}

function give(thread: SolverThread, job: Job): void {
  thread.job = job;
  thread.worker.ref(); // a solve in progress keeps the process alive
  thread.timer = setTimeout(() => drop(thread, tooLong()), job.input.timeLimitMs + GRACE_MS);
  thread.worker.postMessage(job.input);
}

function startThread(): void {
  const worker = new Worker(solverWorkerPath, { workerData: { nice: getEnv().KERFWISE_SOLVER_NICE } });
  pool.started++;
  const thread: SolverThread = { worker, ready: false, job: null, timer: null };
  pool.threads.push(thread);
  // A thread that never gets ready fails the solve that is waiting longest.
  thread.timer = setTimeout(() => drop(thread, tooLong()), START_LIMIT_MS);
  worker.on('message', (reply: WorkerReply) => {
    if (thread.timer) clearTimeout(thread.timer);
    thread.timer = null;
    if ('ready' in reply) {
      thread.ready = true;
      worker.unref(); // an idle thread does not keep the process alive
    } else {
      const job = thread.job;
      thread.job = null;
      worker.unref();
      if (reply.ok) job?.resolve(reply.plan);
      else job?.reject(new Error(reply.message));
    }
    dispatch();
  });
  worker.once('error', (error) => drop(thread, error));
  worker.once('exit', (code) => drop(thread, stoppedUnexpectedly(code)));
}

/** Removes a failed thread from the pool, fails its solve (or the next one waiting), starts no other. */
function drop(thread: SolverThread, error: Error): void {
  const at = pool.threads.indexOf(thread);
  if (at < 0) return; // already dropped (error and exit both fire)
  pool.threads.splice(at, 1);
  if (thread.timer) clearTimeout(thread.timer);
  void thread.worker.terminate();
  const job = thread.job ?? (thread.ready ? null : pool.waiting.shift());
  job?.reject(error);
  dispatch();
}
