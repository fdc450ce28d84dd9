// The browser tests' mail catcher (see playwright.config.ts): SMTP 500 below the app's port, HTTP 10 000 above that.
const PORT = Number(process.env.PW_PORT ?? 3107);
const SMTP_PORT = Number(process.env.PW_SMTP_PORT ?? PORT - 500);
export const MAIL_CATCHER_URL = `http://127.0.0.1:${SMTP_PORT + 10_000}`;

export type CaughtMail = {
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number }[];
};

export async function caughtMail(): Promise<CaughtMail[]> {
  const response = await fetch(`${MAIL_CATCHER_URL}/messages`);
  return ((await response.json()) as { messages: CaughtMail[] }).messages;
}
