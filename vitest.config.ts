import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { defineConfig, type TestProjectInlineConfiguration } from 'vitest/config';

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

const projects: TestProjectInlineConfiguration[] = [
  {
    extends: true,
    test: {
      name: 'pglite',
      include: ['tests/**/*.test.ts'],
      exclude: ['tests/e2e/**', 'tests/server/**', 'tests/instances/**', 'node_modules/**'],
      globalSetup: [snapshotSetup],
    },
  },
];
if (serverUrl) {
  projects.push({
    extends: true,
    test: {
      name: 'postgres',
      include: serverSuites,
      env: { KERFWISE_TEST_SERVER: '1' },
      globalSetup: [snapshotSetup, 'tests/support/server-global-setup.ts'],
    },
  });
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
    projects,
  },
});
