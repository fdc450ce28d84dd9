// Generates a NEXTAUTH_SECRET into .env.local on first run, so the quick start needs no set-up.
// Next.js reads .env.local for both `next dev` and `next start`; an environment variable wins.
import { randomBytes } from 'node:crypto';
import { appendFileSync, existsSync, readFileSync } from 'node:fs';

const file = '.env.local';

export function ensureLocalSecret(): void {
  if (process.env.NEXTAUTH_SECRET) return;
  const current = existsSync(file) ? readFileSync(file, 'utf8') : '';
  if (/^NEXTAUTH_SECRET=/m.test(current)) return;
  const lines = [`NEXTAUTH_SECRET=${randomBytes(32).toString('base64url')}`];
  if (!/^NEXTAUTH_URL=/m.test(current)) lines.push('NEXTAUTH_URL=http://localhost:3000');
  appendFileSync(file, `${current && !current.endsWith('\n') ? '\n' : ''}${lines.join('\n')}\n`);
  console.log('Kerfwise: generated a sign-in secret in .env.local');
}

if (import.meta.url === `file://${process.argv[1]}`) ensureLocalSecret();
