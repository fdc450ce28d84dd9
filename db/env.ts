// The database's own settings. db/ reads them here so it needs nothing from lib/; lib/env.ts extends
// this schema with the rest of the app's settings, so each variable is still defined once.
import path from 'node:path';
import { z } from 'zod';

export const databaseEnvSchema = z.object({
  KERFWISE_DATA_DIR: z.string().min(1).default('.data'),
  // Set: a PostgreSQL server (several app instances and workers may share it). Unset: embedded PGlite.
  DATABASE_URL: z.string().min(1).optional(),
  KERFWISE_DB_POOL_SIZE: z.coerce.number().int().min(1).max(100).default(10),
});

export function databaseEnv(): z.infer<typeof databaseEnvSchema> {
  return databaseEnvSchema.parse(process.env);
}

/** Absolute path of the embedded database folder. */
export function dataDirPath(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), databaseEnv().KERFWISE_DATA_DIR);
}

/** The PostgreSQL server's URL, or null for the embedded database. */
export function databaseUrl(): string | null {
  return databaseEnv().DATABASE_URL ?? null;
}
