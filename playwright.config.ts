import { defineConfig, devices, type PlaywrightTestConfig } from '@playwright/test';
import { stackAt, type Stack } from './tests/e2e/support/stack';

// Browser tests run against production servers on their own ports, each with a fresh data folder,
// its own mail catcher and its own payment fake (a "stack", tests/e2e/support/stack.ts). The spec
// files are shared between two stacks that run side by side, one worker each, so that a spec file
// still runs alone on its server, after the files before it in its group, in the same order every run.
// PW_PORT sets the first stack's port (the second is 100 above), so several worktrees can run their
// browser tests side by side; PW_SERVERS=1 runs every spec on one stack, as a loaded machine may need.
const PORT = Number(process.env.PW_PORT ?? 3107);
const SERVERS = process.env.PW_SERVERS === '1' ? 1 : 2;
// PW_SKIP_BUILD=1 reuses the last production build when only tests changed (never in CI).
const SKIP_BUILD = process.env.PW_SKIP_BUILD === '1' && !process.env.CI;

// The first stack's spec files; the second stack runs all the others, so a new spec file runs there
// unless it is listed here. The split balances the measured times (README, "Tests"). Some specs
// build on what an earlier one left: release-conflict.spec needs the section settings quote-owner.spec
// saves, so both stay on the second stack, in that order.
const FIRST_STACK = [
  'accessibility.spec.ts',
  'customer-email.spec.ts',
  'first-day.spec.ts',
  'frame-schedule.spec.ts',
  'offcut-rack.spec.ts',
];

const stacks = Array.from({ length: SERVERS }, (_, i) => stackAt(PORT + 100 * i));

const common = {
  NEXTAUTH_SECRET: 'e2e-only-secret-not-for-production-use',
  NEXT_TELEMETRY_DISABLED: '1',
};

function payments(stack: Stack) {
  return {
    KERFWISE_PAYMENTS_API_URL: stack.paymentsURL,
    KERFWISE_PAYMENTS_SECRET_KEY: 'sk_test_e2e_only',
    KERFWISE_PAYMENTS_WEBHOOK_SECRET: 'whsec_e2e_only',
    KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL: `${stack.baseURL}/api/payments/webhook`,
  };
}

// The servers start one after another: only the first builds, the others start the same build.
function servers(stack: Stack, build: boolean): NonNullable<PlaywrightTestConfig['webServer']> {
  const { dataDir } = stack;
  const mail = {
    KERFWISE_SMTP_PORT: String(stack.smtpPort),
    KERFWISE_MAIL_CATCHER_URL: stack.mailCatcherURL,
  };
  return [
    {
      command: 'npx tsx scripts/mail-catcher.ts',
      url: `${stack.mailCatcherURL}/health`,
      timeout: 60_000,
      reuseExistingServer: false,
      env: mail,
    },
    {
      command: 'npx tsx scripts/payment-fake.ts',
      url: `${stack.paymentsURL}/health`,
      timeout: 60_000,
      reuseExistingServer: false,
      env: payments(stack),
    },
    {
      // The build must not open the data folder: a lock it left behind would refuse the server.
      command:
        `rm -rf ${dataDir} ${dataDir}.lock && ${build ? 'npx next build' : 'true'} && ` +
        `(test ! -e ${dataDir}.lock || (echo 'next build opened the data folder' >&2 && exit 1)) && ` +
        `npx next start -p ${stack.port} -H 127.0.0.1`,
      url: `${stack.baseURL}/api/health`,
      timeout: 600_000,
      reuseExistingServer: false,
      env: {
        KERFWISE_DATA_DIR: dataDir,
        KERFWISE_DEMO: '1',
        NEXTAUTH_URL: stack.baseURL,
        ...common,
        ...mail,
        ...payments(stack),
      },
    },
  ];
}

export default defineConfig({
  testDir: './tests/e2e',
  fullyParallel: false,
  workers: SERVERS,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  outputDir: 'test-results',
  use: {
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--disable-gpu',
        '--disable-dev-shm-usage',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
      ],
    },
  },
  projects: stacks.map((stack, i) => ({
    name: `server-${i + 1}`,
    workers: 1,
    ...(SERVERS === 1 ? {} : i === 0 ? { testMatch: FIRST_STACK } : { testIgnore: FIRST_STACK }),
    use: { ...devices['Desktop Chrome'], channel: undefined, baseURL: stack.baseURL },
  })),
  webServer: stacks.flatMap((stack, i) => servers(stack, i === 0 && !SKIP_BUILD)),
});
