// `npm run dev`: makes sure a sign-in secret exists, starts the local mail catcher and payment fake, then serves
// Kerfwise on http://localhost:3000. The server migrates the database and seeds the demo yard at start.
import { spawn } from 'node:child_process';
import { getEnv } from '../lib/env';
import { catcherHttpPort } from '../lib/mail/mail-catcher';
import { ensureLocalSecret } from './ensure-secret';

ensureLocalSecret();

const smtpPort = getEnv().KERFWISE_SMTP_PORT;
const catcherUrl = getEnv().KERFWISE_MAIL_CATCHER_URL ?? `http://127.0.0.1:${catcherHttpPort(smtpPort)}`;
// The development server seeds the demo yard (with its demo sign-ins) into an empty database.
const env = {
  KERFWISE_DEMO: '1',
  ...process.env,
  KERFWISE_MAIL_CATCHER_URL: catcherUrl,
  KERFWISE_PAYMENTS_API_URL: getEnv().KERFWISE_PAYMENTS_API_URL ?? 'http://127.0.0.1:12111',
  KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL:
    getEnv().KERFWISE_PAYMENTS_FAKE_WEBHOOK_URL ?? 'http://localhost:3000/api/payments/webhook',
};

const catcher = spawn('npx', ['tsx', 'scripts/mail-catcher.ts'], { stdio: 'inherit', env });
const payments = spawn('npx', ['tsx', 'scripts/payment-fake.ts'], { stdio: 'inherit', env });
const next = spawn('npx', ['next', 'dev', ...process.argv.slice(2)], { stdio: 'inherit', env });
next.on('exit', (code) => {
  catcher.kill('SIGTERM');
  payments.kill('SIGTERM');
  process.exit(code ?? 0);
});
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    catcher.kill(signal);
    payments.kill(signal);
    next.kill(signal);
  });
}
