// Calls route handlers directly, as a given demo user, against an in-memory database.
import { NextRequest } from 'next/server';
import { setDbForTests } from '@/db';
import { createTestDb, type Fixture } from './test-db';

// The session mock lives in setup.ts (vi.mock must run before the handlers are imported).
const session = (globalThis as unknown as { kerfwiseTestSession: { userId: number | null } })
  .kerfwiseTestSession;

/** Demo user ids in seed order. */
export const AS = { nobody: null, owner: 1, hand: 2, saw: 3 } as const;

export function actAs(userId: number | null): void {
  session.userId = userId;
}

/** The file's test database (the demo yard unless a minimal fixture is given), as the server's database. */
export async function useApiTestDb(options: { fixture?: Fixture } = {}) {
  const testDb = await createTestDb(options);
  setDbForTests(testDb.db);
  return {
    ...testDb,
    close: async () => {
      setDbForTests(undefined);
      await testDb.close();
    },
  };
}

type Handler<P> = (req: NextRequest, ctx: { params: Promise<P> }) => Promise<Response>;

export async function call<P = Record<string, string>>(
  handler: Handler<P>,
  {
    method = 'GET',
    url = 'http://test.local/api',
    body,
    params,
    headers,
  }: {
    method?: string;
    url?: string;
    body?: unknown;
    params?: P;
    headers?: Record<string, string>;
  } = {},
) {
  const init: { method: string; headers: Record<string, string>; body?: string } = {
    method,
    headers: { 'content-type': 'application/json', ...headers },
  };
  if (body !== undefined) init.body = typeof body === 'string' ? body : JSON.stringify(body);
  const response = await handler(new NextRequest(url, init), {
    params: Promise.resolve((params ?? {}) as P),
  });
  const text = await response.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = text;
  }
  return { status: response.status, json: json as any, response };
}
