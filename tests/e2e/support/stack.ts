// Where the browser tests' servers listen. Each test project has a stack of its own: a production
// server with its own data folder, a mail catcher and a payment fake, on ports derived from the
// app's port, so projects run side by side without sharing data, mail or payments.
import { test } from '@playwright/test';

export type Stack = {
  port: number;
  baseURL: string;
  /** The server's data folder, made fresh for every run. */
  dataDir: string;
  /** The mail catcher takes SMTP 500 below the app's port and lists caught mail over HTTP 10 000 above that. */
  smtpPort: number;
  mailCatcherURL: string;
  /** The payment fake listens 1000 above the app's port and posts its events to the app. */
  paymentsURL: string;
};

export function stackAt(port: number): Stack {
  const smtpPort = port - 500;
  return {
    port,
    baseURL: `http://127.0.0.1:${port}`,
    dataDir: `.data-e2e-${port}`,
    smtpPort,
    mailCatcherURL: `http://127.0.0.1:${smtpPort + 10_000}`,
    paymentsURL: `http://127.0.0.1:${port + 1000}`,
  };
}

/** The stack the running test talks to: the one behind its project's baseURL. */
export function currentStack(): Stack {
  const { baseURL } = test.info().project.use;
  if (!baseURL) throw new Error('The test project has no baseURL.');
  return stackAt(Number(new URL(baseURL).port));
}
