// A long-lived solver thread: it loads the cutting engine and HiGHS once, warms HiGHS up, then
// solves one job at a time for as long as the server runs (lib/plans/run-solver.ts keeps the pool).
// Plain JavaScript on purpose: Node loads it as is under `next dev`, `next start` and Vitest alike,
// and tsx compiles the TypeScript solver on the fly (its cache makes later starts quick).
import { parentPort } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

const { prepareSolver, solve } = await tsImport('../../solver/index.ts', import.meta.url);
// The integer step (HiGHS, WebAssembly) loads once per thread, and a small built-in job warms it, so
// no customer's plan pays for the slow first models; without HiGHS the heuristics still plan.
await prepareSolver({ warmUp: true }).catch(() => undefined);

parentPort?.on('message', (input) => {
  try {
    parentPort?.postMessage({ ok: true, plan: solve(input) });
  } catch (error) {
    parentPort?.postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
});
// Jobs are sent once the thread says it is ready, so a solve's deadline never counts the start-up.
parentPort?.postMessage({ ready: true });
