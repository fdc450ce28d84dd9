// Puts a database's rows back as they were, in milliseconds, so tests in one file can share one
// database (opening or cloning one takes seconds on this machine). Works on PGlite and on a server.

/** What both an embedded PGlite and a server pool offer for raw SQL. */
export interface SqlClient {
  query<T>(text: string, params?: unknown[]): Promise<{ rows: T[] }>;
  /** Several statements in one string, no parameters. */
  exec(text: string): Promise<unknown>;
}

const ident = (name: string) => `"${name.replace(/"/g, '""')}"`;

export interface SavedRows {
  restore: () => Promise<void>;
}

/** Copies every table of the public schema aside (into the schema `aside`), with the sequences' positions. */
export async function saveRows(client: SqlClient, aside = 'test_saved_rows'): Promise<SavedRows> {
  const SAVED = ident(aside);
  const tables = (
    await client.query<{ name: string }>(
      `select tablename as name from pg_tables where schemaname = 'public' order by tablename`,
    )
  ).rows.map((r) => ident(r.name));
  const sequences = (
    await client.query<{ name: string; last: number | null }>(
      `select sequencename as name, last_value::int as last from pg_sequences where schemaname = 'public'`,
    )
  ).rows;
  await client.exec(
    [
      `drop schema if exists ${SAVED} cascade`,
      `create schema ${SAVED}`,
      ...tables.map((t) => `create table ${SAVED}.${t} as table public.${t}`),
    ].join(';\n'),
  );
  const restoreSql = [
    'begin',
    // Rows go back in any order: foreign keys are not checked while the copy runs.
    'set local session_replication_role = replica',
    tables.length ? `truncate ${tables.map((t) => `public.${t}`).join(', ')}` : '',
    ...tables.map((t) => `insert into public.${t} select * from ${SAVED}.${t}`),
    ...sequences.map((s) =>
      s.last === null
        ? `select setval('public.${ident(s.name)}', 1, false)`
        : `select setval('public.${ident(s.name)}', ${s.last}, true)`,
    ),
    'commit',
  ]
    .filter(Boolean)
    .join(';\n');
  return { restore: async () => void (await client.exec(restoreSql)) };
}
