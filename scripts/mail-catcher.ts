// `tsx scripts/mail-catcher.ts`: a local SMTP catcher on KERFWISE_SMTP_PORT for development and
// browser tests. Caught mail is listed at http://127.0.0.1:<smtp port + 10000>/messages and kept in .mail/.
import path from 'node:path';
import { getEnv } from '../lib/env';
import { catcherHttpPort, startMailCatcher } from '../lib/mail/mail-catcher';

const env = getEnv();
const smtpPort = env.KERFWISE_SMTP_PORT;
const httpPort = env.KERFWISE_MAIL_CATCHER_URL
  ? Number(new URL(env.KERFWISE_MAIL_CATCHER_URL).port)
  : catcherHttpPort(smtpPort);
const dir = path.resolve(process.cwd(), '.mail', String(smtpPort));

startMailCatcher({ smtpPort, httpPort, dir }).then(
  (catcher) => {
    console.log(
      `Mail catcher: SMTP on 127.0.0.1:${smtpPort}, caught mail at http://127.0.0.1:${httpPort}/messages`,
    );
    for (const signal of ['SIGINT', 'SIGTERM'] as const)
      process.on(signal, () => catcher.close().then(() => process.exit(0)));
  },
  (error: Error) => {
    console.error(`Mail catcher could not start: ${error.message}`);
    process.exit(1);
  },
);
