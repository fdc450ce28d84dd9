// Starts production app instances (`next start` on an existing build), and talks to them over HTTP
// as a signed-in person would. Used by the two-instance test and the load benchmark.
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';

export type AppInstance = { base: string; child: ChildProcess; output: () => string };

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

/** env names the database: DATABASE_URL for a PostgreSQL server, or KERFWISE_DATA_DIR (embedded). */
export async function startInstance(env: Record<string, string>) {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      NEXTAUTH_URL: base,
      NEXT_TELEMETRY_DISABLED: '1',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true, // its own process group, so stopping it reaches next's children too
  });
  let text = '';
  child.stdout?.on('data', (d) => (text += d));
  child.stderr?.on('data', (d) => (text += d));
  return { base, child, output: () => text } satisfies AppInstance;
}

export async function waitUntilHealthy(instance: AppInstance, timeoutMs: number): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    if (instance.child.exitCode !== null) throw new Error(`The instance exited:\n${instance.output()}`);
    const ok = await fetch(`${instance.base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`The instance at ${instance.base} did not become healthy:\n${instance.output()}`);
}

export function stopInstance(instance: AppInstance): Promise<void> {
  return new Promise((resolve) => {
    if (instance.child.exitCode !== null || instance.child.signalCode !== null) return resolve();
    instance.child.once('exit', () => resolve());
    process.kill(-instance.child.pid!, 'SIGTERM');
  });
}

const cookiesOf = (res: Response) => res.headers.getSetCookie().map((c) => c.split(';')[0]);

/** Signs in through the credentials endpoint; returns the cookie header for later requests. */
export async function signIn(base: string, email: string, password: string): Promise<string> {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookiesOf(csrf).join('; ') },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
  });
  const session = cookiesOf(res).find((c) => c.includes('session-token='));
  if (!session) throw new Error(`Sign-in as ${email} failed (${res.status})`);
  return session;
}

/** A JSON request to an instance with the given session cookie. */
export async function api(
  base: string,
  cookie: string,
  path: string,
  { method = 'GET', body }: { method?: string; body?: unknown } = {},
) {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { cookie, 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  return { status: res.status, json: text ? JSON.parse(text) : null };
}
