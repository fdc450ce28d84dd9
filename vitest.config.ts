import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { defineConfig, type TestProjectInlineConfiguration } from 'vitest/config';
import { WaitingFirstSequencer } from './tests/support/waiting-first-sequencer';

// The suites whose data work can differ on a PostgreSQL server run twice: on embedded PGlite, and on
// a server when KERFWISE_TEST_DATABASE_URL names one (`.ci/run` starts a throwaway cluster and sets
// it). PGlite is the same PostgreSQL engine, so the second run is for what only a server brings: a
// pool of connections racing each other (releases, confirmations, counters, movements), the `pg`
// driver's value types (sums and counts in reports), and the queue. Suites of parsing, geometry and
// request checks gain nothing from a second database and run once.
const serverSuites = [
  'tests/api/offcuts.test.ts',
  'tests/api/reports.test.ts',
  'tests/api/stock.test.ts',
  'tests/api/users.test.ts',
  'tests/frames-api/send-to-job.test.ts',
  'tests/jobs/jobs-api.test.ts',
  'tests/plans/plans-api.test.ts',
  'tests/quotes/quotes-api.test.ts',
  'tests/saw/board-done.test.ts',
  'tests/saw/defect.test.ts',
  'tests/stock/**/*.test.ts',
  'tests/server/**/*.test.ts',
];
const serverUrl = process.env.KERFWISE_TEST_DATABASE_URL;
const snapshotSetup = 'tests/support/global-setup.ts';

// Most files run many to a process (`isolate: false`): each process keeps its embedded databases and
// loaded modules for the next file, which saves seconds per file (see tests/support/test-db.ts). The
// files below need a process of their own: they mock modules, or count or tune the process's solver
// threads.
const ownProcessSuites = [
  'tests/auth/sign-in-throttle.test.ts',
  'tests/plans/run-solver.test.ts',
  'tests/plans/solver-priority.test.ts',
  'tests/saw/defect.test.ts',
  'tests/security/authorisation-matrix.test.ts',
];
const notEmbedded = ['tests/e2e/**', 'tests/server/**', 'tests/instances/**', 'node_modules/**'];

const projects: TestProjectInlineConfiguration[] = [
  {
    extends: true,
    test: {
      name: 'pglite',
      include: ['tests/**/*.test.ts'],
      exclude: [...notEmbedded, ...ownProcessSuites],
      isolate: false,
      env: { KERFWISE_TEST_REUSE_DB: '1' },
      globalSetup: [snapshotSetup],
    },
  },
  {
    extends: true,
    test: {
      name: 'pglite-own-process',
      include: ownProcessSuites,
      globalSetup: [snapshotSetup],
    },
  },
];
if (serverUrl) {
  const serverSetup = [snapshotSetup, 'tests/support/server-global-setup.ts'];
  // The same split: the queue's client is one per process, and the defect suite mocks the solver.
  const serverOwnProcessSuites = ['tests/saw/defect.test.ts', 'tests/server/**/*.test.ts'];
  projects.push(
    {
      extends: true,
      test: {
        name: 'postgres',
        include: serverSuites,
        exclude: serverOwnProcessSuites,
        isolate: false,
        env: { KERFWISE_TEST_SERVER: '1', KERFWISE_TEST_REUSE_DB: '1' },
        globalSetup: serverSetup,
      },
    },
    {
      extends: true,
      test: {
        name: 'postgres-own-process',
        include: serverOwnProcessSuites,
        env: { KERFWISE_TEST_SERVER: '1' },
        globalSetup: serverSetup,
      },
    },
  );
} else {
  // Said from a global setup: the config itself is loaded more than once, so a log here printed twice.
  projects[0].test!.globalSetup = [snapshotSetup, 'tests/support/postgres-skipped-notice.ts'];
}

export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\/(.*)$/, replacement: fileURLToPath(new URL('./$1', import.meta.url)) },
      // `server-only` throws outside a React server bundle; tests import data-access modules directly.
      {
        find: 'server-only',
        replacement: fileURLToPath(new URL('./tests/support/empty.ts', import.meta.url)),
      },
    ],
  },
  test: {
    environment: 'node',
    testTimeout: 30_000,
    // The first file to need the demo yard seeds it for the whole run; on a busy machine that is slow.
    hookTimeout: 300_000,
    pool: 'forks',
    // Vitest's default is one worker fewer than the cores: a single worker on a 2-core machine. Much of
    // a test file's time is spent waiting (child processes, the PostgreSQL server, solver threads), so
    // two workers there use the second core; `KERFWISE_TEST_WORKERS` overrides.
    maxWorkers: Number(process.env.KERFWISE_TEST_WORKERS) || Math.max(2, availableParallelism() - 1),
    setupFiles: ['tests/support/setup.ts'],
    sequence: { sequencer: WaitingFirstSequencer },
    projects,
  },
});
