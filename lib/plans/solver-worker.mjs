// Solves in a worker thread so a long search never blocks the server's event loop.
// Plain JavaScript on purpose: Node loads it as is under `next dev`, `next start` and Vitest alike,
// and tsx compiles the TypeScript solver on the fly (its cache makes later starts quick).
import { parentPort } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

const { prepareSolver, solve } = await tsImport('../../solver/index.ts', import.meta.url);
// The integer step (HiGHS, WebAssembly) loads once per worker; without it the heuristics still plan.
await prepareSolver().catch(() => undefined);

parentPort?.on('message', (input) => {
  try {
    parentPort?.postMessage({ ok: true, plan: solve(input) });
  } catch (error) {
    parentPort?.postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
});
// The caller's deadline starts now, once the solver is loaded.
parentPort?.postMessage({ ready: true });
