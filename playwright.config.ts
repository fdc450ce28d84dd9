import { defineConfig, devices } from '@playwright/test';

// Browser tests run against a production build on its own port with a fresh data folder.
// PW_PORT lets several worktrees run their browser tests side by side.
const PORT = Number(process.env.PW_PORT ?? 3107);
// PW_SKIP_BUILD=1 reuses the last production build when only tests changed (never in CI).
const SKIP_BUILD = process.env.PW_SKIP_BUILD === '1' && !process.env.CI;
const baseURL = `http://127.0.0.1:${PORT}`;
const dataDir = `.data-e2e-${PORT}`;
// The mail catcher listens for SMTP 500 below the app's port (3141 → 2641) unless PW_SMTP_PORT says
// otherwise, and lists caught mail over HTTP 10 000 above its SMTP port.
const SMTP_PORT = Number(process.env.PW_SMTP_PORT ?? PORT - 500);
const MAIL_CATCHER_URL = `http://127.0.0.1:${SMTP_PORT + 10_000}`;
// The payment-service fake listens 1000 above the app's port and posts its events to the app.
const PAYMENTS = {
  KERFWISE_PAYMENTS_API_URL: `http://127.0.0.1:${PORT + 1000}`,
  KERFWISE_PAYMENTS_SECRET_KEY: 'sk_test_e2e_only',
  KERFWISE_PAYMENTS_WEBHOOK_SECRET: 'whsec_e2e_only',
  KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL: `${baseURL}/api/payments/webhook`,
};

export default defineConfig({
  testDir: './tests/e2e',
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: process.env.CI ? [['list']] : [['list']],
  outputDir: 'test-results',
  use: {
    baseURL,
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
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'], channel: undefined } }],
  webServer: [
    {
      command: 'npx tsx scripts/mail-catcher.ts',
      url: `${MAIL_CATCHER_URL}/health`,
      timeout: 60_000,
      reuseExistingServer: false,
      env: { KERFWISE_SMTP_PORT: String(SMTP_PORT), KERFWISE_MAIL_CATCHER_URL: MAIL_CATCHER_URL },
    },
    {
      command: 'npx tsx scripts/payment-fake.ts',
      url: `${PAYMENTS.KERFWISE_PAYMENTS_API_URL}/health`,
      timeout: 60_000,
      reuseExistingServer: false,
      env: PAYMENTS,
    },
    {
      // The build must not open the data folder: a lock it left behind would refuse the server.
      command:
        `rm -rf ${dataDir} ${dataDir}.lock && ${SKIP_BUILD ? 'true' : 'npx next build'} && ` +
        `(test ! -e ${dataDir}.lock || (echo 'next build opened the data folder' >&2 && exit 1)) && ` +
        `npx next start -p ${PORT} -H 127.0.0.1`,
      url: `${baseURL}/api/health`,
      timeout: 600_000,
      reuseExistingServer: false,
      env: {
        KERFWISE_DATA_DIR: dataDir,
        KERFWISE_DEMO: '1',
        NEXTAUTH_SECRET: 'e2e-only-secret-not-for-production-use',
        NEXTAUTH_URL: baseURL,
        NEXT_TELEMETRY_DISABLED: '1',
        KERFWISE_SMTP_PORT: String(SMTP_PORT),
        KERFWISE_MAIL_CATCHER_URL: MAIL_CATCHER_URL,
        ...PAYMENTS,
      },
    },
  ],
});
