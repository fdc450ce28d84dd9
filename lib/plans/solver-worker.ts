// Runs one solve in a worker thread so a long search never blocks the server's event loop.
import { parentPort } from 'node:worker_threads';
import { solve, type SolveInput } from '@/solver';

parentPort?.on('message', (input: SolveInput) => {
  try {
    parentPort?.postMessage({ ok: true, plan: solve(input) });
  } catch (error) {
    parentPort?.postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
});
