// The mail catcher of the stack the test runs against (see stack.ts).
import { currentStack } from './stack';

export type CaughtMail = {
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number }[];
};

export async function caughtMail(): Promise<CaughtMail[]> {
  const response = await fetch(`${currentStack().mailCatcherURL}/messages`);
  return ((await response.json()) as { messages: CaughtMail[] }).messages;
}
