// Regenerates the SQL migrations from db/schema.ts.
// Until the first release every schema change folds into one initial migration, so branches never
// fight over migration numbers; after a release switch to plain `drizzle-kit generate`.
import { execSync } from 'node:child_process';
import { rmSync } from 'node:fs';

rmSync('drizzle', { recursive: true, force: true });
execSync('npx drizzle-kit generate --name init', { stdio: 'inherit' });
