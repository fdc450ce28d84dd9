// Reads one job as JSON on stdin, writes its plan as JSON on stdout. Bad input: exit 2, one line on stderr.

import { solveInputSchema } from './input-schema';
import { prepareSolver } from './prepare';
import { solve } from './solve';

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

function fail(message: string): never {
  process.stderr.write(`${message.replace(/\s+/g, ' ').trim()}\n`);
  process.exit(2);
}

const text = await readStdin();
let raw: unknown;
try {
  raw = JSON.parse(text);
} catch (e) {
  fail(`invalid JSON: ${(e as Error).message}`);
}
const parsed = solveInputSchema.safeParse(raw);
if (!parsed.success) {
  const issue = parsed.error.issues[0];
  fail(`invalid job: ${issue.path.join('.') || '(root)'}: ${issue.message}`);
}
await prepareSolver();
process.stdout.write(`${JSON.stringify(solve(parsed.data))}\n`);
