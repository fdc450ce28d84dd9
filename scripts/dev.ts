// `npm run dev`: makes sure a sign-in secret exists, then serves Kerfwise on http://localhost:3000.
// The database is migrated and the demo yard seeded by the server itself on first request.
import { spawn } from 'node:child_process';
import { ensureLocalSecret } from './ensure-secret';

ensureLocalSecret();

const next = spawn('npx', ['next', 'dev', ...process.argv.slice(2)], { stdio: 'inherit' });
next.on('exit', (code) => process.exit(code ?? 0));
for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => next.kill(signal));
