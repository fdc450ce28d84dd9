// Runs once when the server process starts (instrumentation.ts), before it serves any request:
// checks the settings, takes the data folder's lock, opens, migrates and prepares the database, and
// answers `npm run db:backup` on the folder's private backup socket, and warms the solver threads.
import { serveBackups } from '@/db/backup-socket';
import { getServerDb, setDatabasePreparation } from '@/db/server-db';
import { dataDirPath, databaseUrl } from '@/db/env';
import { getEnv } from '@/lib/env';
import { warmSolverThreads } from '@/lib/plans/run-solver';
import { prepareYard } from './prepare-yard';

export async function startUp(): Promise<void> {
  const env = getEnv();
  if (env.NODE_ENV === 'production' && !env.NEXTAUTH_SECRET) {
    throw new Error(
      'NEXTAUTH_SECRET is not set. Production needs a sign-in secret of at least 16 characters, ' +
        'e.g. NEXTAUTH_SECRET=$(openssl rand -base64 32) in the environment or .env.local.',
    );
  }
  setDatabasePreparation(prepareYard);
  const { client } = await getServerDb();
  if (client) await serveBackups(dataDirPath(), client);
  // Embedded, plans are solved in this process; on a PostgreSQL server the solver workers do it.
  if (!databaseUrl()) warmSolverThreads();
}

/** A server that cannot open its database must not serve: say why and stop. */
export async function startUpOrExit(): Promise<void> {
  try {
    await startUp();
  } catch (error) {
    console.error(`Kerfwise cannot start: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  }
}
