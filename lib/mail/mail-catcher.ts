// A local SMTP catcher for development and tests: accepts every message, keeps it in memory (and
// optionally as JSON files), and lists caught mail over HTTP. Never used in production.
import { mkdirSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export type CaughtMail = {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number }[];
};

export async function startMailCatcher({
  smtpPort,
  httpPort,
  host = '127.0.0.1',
  dir,
}: {
  smtpPort: number;
  httpPort?: number;
  host?: string;
  dir?: string;
}) {
  const caught: CaughtMail[] = [];
  if (dir) mkdirSync(dir, { recursive: true });
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const entry: CaughtMail = {
            id: caught.length + 1,
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            attachments: mail.attachments.map((a) => ({
              filename: a.filename ?? '',
              contentType: a.contentType,
              size: a.size,
            })),
          };
          caught.push(entry);
          if (dir)
            writeFileSync(
              path.join(dir, `${String(entry.id).padStart(5, '0')}.json`),
              JSON.stringify(entry, null, 2),
            );
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(smtpPort, host, () => resolve());
  });

  let web: http.Server | undefined;
  if (httpPort) {
    web = http.createServer((req, res) => {
      if (req.url?.startsWith('/messages') && req.method === 'DELETE') caught.length = 0;
      res.setHeader('content-type', 'application/json');
      res.end(JSON.stringify(req.url?.startsWith('/health') ? { ok: true } : { messages: caught }));
    });
    await new Promise<void>((resolve, reject) => {
      web!.once('error', reject);
      web!.listen(httpPort, host, () => resolve());
    });
  }
  return {
    /** The SMTP port actually listened on (useful when started on port 0). */
    smtpPort: (smtp.server.address() as AddressInfo).port,
    messages: () => [...caught],
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      if (web) await new Promise<void>((resolve) => web!.close(() => resolve()));
    },
  };
}

/** The catcher's HTTP port sits 10 000 above its SMTP port unless given. */
export const catcherHttpPort = (smtpPort: number) => smtpPort + 10_000;
