// Starts extra production servers (the build Playwright already made) for the process-level checks:
// a second server on a held folder, kill -9 and restart. Each runs in its own process group so a
// kill reaches the whole server.
import { spawn, type ChildProcess } from 'node:child_process';

export type OwnServer = {
  child: ChildProcess;
  baseURL: string;
  /** Everything the process wrote to stdout and stderr so far. */
  output: () => string;
  /** Resolves with the exit code (or the signal's name) once the process has ended. */
  exited: Promise<number | string>;
};

export function serverEnv(dataDir: string, port: number): NodeJS.ProcessEnv {
  return {
    ...process.env,
    NODE_ENV: 'production',
    KERFWISE_DATA_DIR: dataDir,
    KERFWISE_DEMO: '1',
    NEXTAUTH_SECRET: 'e2e-only-secret-not-for-production-use',
    NEXTAUTH_URL: `http://127.0.0.1:${port}`,
    NEXT_TELEMETRY_DISABLED: '1',
  };
}

/** Runs a command in its own process group and collects its output. */
export function startProcess(
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv,
  baseURL = '',
): OwnServer {
  const child = spawn(command, args, { env, detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
  let text = '';
  child.stdout!.on('data', (chunk: Buffer) => (text += chunk));
  child.stderr!.on('data', (chunk: Buffer) => (text += chunk));
  const exited = new Promise<number | string>((resolve) =>
    child.on('exit', (code, signal) => resolve(code ?? signal ?? 'unknown')),
  );
  return { child, baseURL, output: () => text, exited };
}

export function startServer(dataDir: string, port: number): OwnServer {
  return startProcess(
    process.execPath,
    ['node_modules/next/dist/bin/next', 'start', '-p', String(port), '-H', '127.0.0.1'],
    serverEnv(dataDir, port),
    `http://127.0.0.1:${port}`,
  );
}

/** Waits until the server answers its health check, or fails with what it printed. */
export async function waitForHealth(server: OwnServer, timeoutMs = 60_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  let ended = false;
  void server.exited.then(() => (ended = true));
  while (Date.now() < until && !ended) {
    try {
      if ((await fetch(`${server.baseURL}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`The server did not become healthy:\n${server.output()}`);
}

/** Sends a signal to the server's whole process group and waits for it to end. */
export async function stopServer(server: OwnServer, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  try {
    process.kill(-server.child.pid!, signal);
  } catch {
    // already gone
  }
  await server.exited;
}
