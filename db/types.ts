// One database type for the whole app, whichever driver is underneath (embedded PGlite or a
// PostgreSQL server through node-postgres): both are Drizzle Postgres databases over the same schema.
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type * as schema from './schema';

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
/** Either the database or an open transaction: data-access functions accept both. */
export type DbOrTx = Db | Tx;
