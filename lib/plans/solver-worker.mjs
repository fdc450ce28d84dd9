// A long-lived solver thread: it loads the cutting engine and HiGHS once, then solves one job at a
// time for as long as the server runs (lib/plans/run-solver.ts keeps the pool of these threads).
// Plain JavaScript on purpose: Node loads it as is under `next dev`, `next start` and Vitest alike,
// and tsx compiles the TypeScript solver on the fly (its cache makes later starts quick).
import { setPriority } from 'node:os';
import { parentPort, workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

// This thread alone yields the CPU (Linux sets priority per thread): the server's own thread keeps
// answering pages and the saw's polling while a plan is solved.
try {
  setPriority(workerData?.nice ?? 0);
} catch {
  // Not allowed to change it here: solve at the priority given.
}

const { prepareSolver, solve } = await tsImport('../../solver/index.ts', import.meta.url);
// The integer step (HiGHS, WebAssembly) loads once per thread; without it the heuristics still plan.
await prepareSolver().catch(() => undefined);

parentPort?.on('message', (input) => {
  try {
    parentPort?.postMessage({ ok: true, plan: solve(input) });
  } catch (error) {
    parentPort?.postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
});
// Jobs are sent once the thread says it is ready, so a solve's deadline never counts the start-up.
parentPort?.postMessage({ ready: true });
// HiGHS's first models in a thread are several times slower (WebAssembly optimises as it runs), so
// built-in jobs warm it up in the first idle moment: a job already waiting goes first, and
// no later plan pays for the cold start.
setTimeout(() => void prepareSolver({ warmUp: true }).catch(() => undefined), 100);
