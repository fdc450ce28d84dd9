// Runs one solve in a worker thread so a long search never blocks the server's event loop.
import { parentPort } from 'node:worker_threads';
import { prepareSolver, solve, type SolveInput } from '@/solver';

parentPort?.on('message', async (input: SolveInput) => {
  try {
    // The integer step (HiGHS, WebAssembly) loads once per worker; without it the heuristics still plan.
    await prepareSolver().catch(() => undefined);
    parentPort?.postMessage({ ok: true, plan: solve(input) });
  } catch (error) {
    parentPort?.postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
});
