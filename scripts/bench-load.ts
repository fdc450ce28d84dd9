// `npm run bench:load`: a mixed load on loopback against a production build (run `npm run build`
// first). Yard hands plan 200-piece jobs back to back, saw tablets poll their queue every 5 s, office
// clients open pages. Compares one embedded instance with two instances and two solver workers on
// PostgreSQL (KERFWISE_BENCH_DATABASE_URL, a server URL whose user may create databases).
// Bounded: each level runs for --seconds, then everything is stopped. Writes docs/benchmarks.md's
// "Load" section (then `npx prettier --write docs/benchmarks.md`).
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { api, signIn, startInstance, stopInstance, waitUntilHealthy } from '../tests/instances/app-instance';
import { killWorker, startWorker } from '../tests/server/worker-process';
import { onServer, urlForDatabase } from '../tests/support/server-template';
import { loadTable, percentile, withoutLoadSection, type LoadRow } from './bench-load-table';

const arg = (name: string, fallback: string) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : fallback;
};
const SECONDS = Number(arg('seconds', '30'));
const PLANNER_LEVELS = arg('planners', '1,5,20').split(',').map(Number);
const TABLETS = 6;
const OFFICE_CLIENTS = 3;
const serverUrl = process.env.KERFWISE_BENCH_DATABASE_URL;
const PASSWORD = 'kerfwise'; // the invented demo yard's sign-in
const secret = { NEXTAUTH_SECRET: 'load-benchmark-secret-only', KERFWISE_SMTP_PORT: '9', KERFWISE_DEMO: '1' };

type Target = { base: string; cookies: Record<'hand' | 'saw' | 'owner', string> };
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function timed(pageMs: number[], fn: () => Promise<unknown>) {
  const started = performance.now();
  await fn();
  pageMs.push(performance.now() - started);
}

/** One yard hand: a new 200-piece job, planned, waited for; again until the time is up. */
async function planner(
  target: Target,
  sectionId: number,
  until: number,
  result: { turnaround: number[]; failed: number },
  n: number,
) {
  const cookie = target.cookies.hand;
  for (let round = 0; Date.now() < until; round++) {
    const job = await api(target.base, cookie, '/api/jobs', {
      method: 'POST',
      body: { customerName: `Bench customer ${n}-${round}` },
    });
    const jobId = job.json.job.id;
    for (let row = 0; row < 10; row++) {
      await api(target.base, cookie, `/api/jobs/${jobId}/items`, {
        method: 'POST',
        body: { sectionId, length: 450 + row * 170 + n * 7, quantity: 20 },
      });
    }
    const started = performance.now();
    const planned = await api(target.base, cookie, `/api/jobs/${jobId}/plans`, {
      method: 'POST',
      body: { timeLimitMs: 1000 },
    });
    let status = planned.status === 201 ? 'done' : planned.status === 202 ? 'queued' : 'refused';
    while (status === 'queued' || status === 'running') {
      await sleep(250);
      status = (await api(target.base, cookie, `/api/plan-runs/${planned.json.runId}`)).json.status;
    }
    // A refused or failed plan (e.g. 503, the engine ran out of time on a busy machine) is counted.
    if (status === 'done') result.turnaround.push(performance.now() - started);
    else result.failed++;
  }
}

async function tablet(target: Target, until: number, pageMs: number[]) {
  while (Date.now() < until) {
    await timed(pageMs, () => api(target.base, target.cookies.saw, '/api/saw/queue'));
    await sleep(5000);
  }
}

async function office(target: Target, until: number, pageMs: number[]) {
  const paths = ['/jobs', '/api/jobs', '/overview', '/rack', '/api/sections'];
  for (let i = 0; Date.now() < until; i++) {
    const url = `${target.base}${paths[i % paths.length]}`;
    await timed(pageMs, async () => {
      const res = await fetch(url, { headers: { cookie: target.cookies.owner } });
      await res.text();
      // A page that sent us to sign in would measure the wrong thing.
      if (!res.ok || res.url.includes('/sign-in'))
        throw new Error(`${url} answered ${res.status} (${res.url})`);
    });
    await sleep(1000);
  }
}

async function runLevel(setup: string, targets: Target[], planners: number): Promise<LoadRow> {
  const pageMs: number[] = [];
  const plans = { turnaround: [] as number[], failed: 0 };
  const until = Date.now() + SECONDS * 1000;
  const sections = await api(targets[0].base, targets[0].cookies.owner, '/api/sections');
  const section = sections.json.sections.find((s: { lengths: unknown[] }) => s.lengths.length > 0);
  const at = (i: number) => targets[i % targets.length];
  await Promise.all([
    ...Array.from({ length: planners }, (_, i) => planner(at(i), section.id, until, plans, i)),
    ...Array.from({ length: TABLETS }, (_, i) => tablet(at(i), until, pageMs)),
    ...Array.from({ length: OFFICE_CLIENTS }, (_, i) => office(at(i), until, pageMs)),
  ]);
  return {
    setup,
    planners,
    pageRps: pageMs.length / SECONDS,
    pageP95: percentile(pageMs, 95),
    plans: plans.turnaround.length,
    failed: plans.failed,
    turnaroundMedian: percentile(plans.turnaround, 50),
    turnaroundP95: percentile(plans.turnaround, 95),
  };
}

async function signedIn(base: string): Promise<Target> {
  const [hand, saw, owner] = await Promise.all(
    ['hand', 'saw', 'owner'].map((who) => signIn(base, `${who}@yard.test`, PASSWORD)),
  );
  return { base, cookies: { hand, saw, owner } };
}

async function benchEmbedded(): Promise<LoadRow[]> {
  const dir = mkdtempSync(path.join(tmpdir(), 'kerfwise-bench-'));
  const instance = await startInstance({ ...secret, KERFWISE_DATA_DIR: path.join(dir, 'data') });
  try {
    await waitUntilHealthy(instance, 300_000);
    const target = await signedIn(instance.base);
    const rows: LoadRow[] = [];
    for (const p of PLANNER_LEVELS) rows.push(await runLevel('1 instance, embedded', [target], p));
    return rows;
  } finally {
    await stopInstance(instance);
    rmSync(dir, { recursive: true, force: true });
  }
}

async function benchServer(url: string): Promise<LoadRow[]> {
  const name = `kerfwise_bench_${process.pid}`;
  await onServer(url, [`create database ${name}`]);
  const databaseUrl = urlForDatabase(url, name);
  const instances = await Promise.all(
    [0, 1].map(() => startInstance({ ...secret, DATABASE_URL: databaseUrl })),
  );
  const workers = [startWorker(databaseUrl), startWorker(databaseUrl)];
  try {
    await Promise.all(instances.map((i) => waitUntilHealthy(i, 300_000)));
    const targets = await Promise.all(instances.map((i) => signedIn(i.base)));
    const rows: LoadRow[] = [];
    for (const p of PLANNER_LEVELS)
      rows.push(await runLevel('2 instances + 2 workers, PostgreSQL', targets, p));
    return rows;
  } finally {
    await Promise.all(workers.map((w) => killWorker(w, 'SIGTERM')));
    await Promise.all(instances.map(stopInstance));
    await onServer(url, [`drop database if exists ${name} with (force)`]);
  }
}

const loadAtStart = loadavg()[0];
const rows = [...(await benchEmbedded()), ...(serverUrl ? await benchServer(serverUrl) : [])];
if (!serverUrl) console.log('Server mode skipped: set KERFWISE_BENCH_DATABASE_URL.');
const table = loadTable(rows, {
  seconds: SECONDS,
  tablets: TABLETS,
  officeClients: OFFICE_CLIENTS,
  load: { start: loadAtStart, end: loadavg()[0] },
});
console.log(table);
const docs = 'docs/benchmarks.md';
writeFileSync(docs, `${withoutLoadSection(readFileSync(docs, 'utf8'))}${table}`);
process.exit(0);
