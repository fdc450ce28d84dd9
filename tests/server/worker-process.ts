// Starts and stops `npm run worker` processes against a test database.
import { spawn, type ChildProcess } from 'node:child_process';

export type WorkerProcess = { child: ChildProcess; output: () => string };

export function startWorker(url: string, env: Record<string, string> = {}): WorkerProcess {
  const child = spawn('npx', ['tsx', '--conditions=react-server', 'scripts/worker.ts'], {
    env: { ...process.env, DATABASE_URL: url, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true, // its own process group, so a kill reaches tsx's child too
  });
  let text = '';
  child.stdout?.on('data', (d) => (text += d));
  child.stderr?.on('data', (d) => (text += d));
  return { child, output: () => text };
}

export function killWorker(worker: WorkerProcess, signal: NodeJS.Signals = 'SIGKILL'): Promise<void> {
  return new Promise((resolve) => {
    if (worker.child.exitCode !== null || worker.child.signalCode !== null) return resolve();
    worker.child.once('exit', () => resolve());
    process.kill(-worker.child.pid!, signal);
  });
}

export async function waitFor<T>(
  what: string | (() => string),
  probe: () => Promise<T | null | undefined>,
  timeoutMs: number,
) {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const value = await probe();
    if (value) return value;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`Timed out waiting for ${typeof what === 'string' ? what : what()}`);
}
