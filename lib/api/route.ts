// Route handlers are declared with the action they perform; this wrapper authenticates,
// authorises, and turns every failure into a clear JSON answer (never a raw 500).
import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import { ZodError, type z } from 'zod';
import { requireUser, type CurrentUser } from '@/lib/auth/current-user';
import { isPublicAction, type Action, type PublicAction } from '@/lib/auth/permissions';
import { AppError } from '@/lib/errors';
import { guardRequest, type GuardOptions } from './request-guard';

type Context<P> = { params: Promise<P> };
// Not distributive: a route typed only by its params (A = Action) gets a signed-in user.
type UserFor<A extends Action> = [A] extends [PublicAction] ? null : CurrentUser;
type Handler<P, A extends Action> = (args: {
  req: NextRequest;
  user: UserFor<A>;
  params: P;
}) => Promise<Response>;

/**
 * Public actions (see permissions.ts) skip sign-in and hand the handler no user. Options say what
 * body a write accepts (JSON unless `body: 'csv'`) and its size limit.
 */
export function route<P = Record<string, never>, A extends Action = Action>(
  action: A,
  handler: Handler<P, A>,
  options?: GuardOptions,
) {
  const wrapped = async (request: NextRequest, context: Context<P>): Promise<Response> => {
    try {
      const req = await guardRequest(request, options);
      const user = (isPublicAction(action) ? null : await requireUser(action)) as UserFor<A>;
      const params = (await context?.params) ?? ({} as P);
      return await handler({ req, user, params });
    } catch (error) {
      return errorResponse(error);
    }
  };
  // The authorisation matrix test reads which action each handler performs.
  return Object.assign(wrapped, { action, bodyKind: options?.body ?? 'json' });
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return NextResponse.json({ error: error.message, details: error.details }, { status: error.status });
  }
  if (error instanceof ZodError) {
    return NextResponse.json(
      {
        error: 'Some fields need attention.',
        issues: error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })),
      },
      { status: 422 },
    );
  }
  const fromDatabase = databaseErrorAnswer(error);
  if (fromDatabase) return errorResponse(fromDatabase);
  console.error('Unhandled error in a route handler', describeForLog(error));
  return NextResponse.json(
    { error: 'Something went wrong on our side. Nothing was changed.' },
    { status: 500 },
  );
}

/** Parses a JSON body with a schema: 400 for a body that is not JSON, 422 for one that does not fit. */
export async function parseJsonBody<S extends z.ZodType>(req: Request, schema: S): Promise<z.infer<S>> {
  let body: unknown;
  try {
    body = await req.json();
  } catch {
    throw new AppError('invalid', 'The request body must be JSON.');
  }
  return schema.parse(body);
}

/** Largest id a Postgres `integer`/`serial` column holds. */
export const MAX_ID = 2_147_483_647;

/** Parses a route parameter that must be a positive whole number (an id): digits only, no sign,
 *  spaces, hex or leading zeros, and within the integer column's range. */
export function parseId(value: string | undefined, what: string): number {
  const id = value !== undefined && /^[1-9][0-9]{0,9}$/.test(value) ? Number(value) : NaN;
  if (!(id <= MAX_ID)) throw new AppError('not_found', `${what} was not found.`);
  return id;
}

/** The SQLSTATE of a database error, whether raw or wrapped by Drizzle (as `cause`). */
function sqlState(error: unknown): string | undefined {
  for (let e = error, depth = 0; e && typeof e === 'object' && depth < 3; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return code;
    e = (e as { cause?: unknown }).cause;
  }
  return undefined;
}

/** A last line of defence: constraint and data errors the checks above missed are the client's (4xx). */
function databaseErrorAnswer(error: unknown): AppError | null {
  const code = sqlState(error);
  if (!code) return null;
  if (code === '23505') return new AppError('conflict', 'That already exists; reload and try again.');
  if (code === '23503' || code === '40001')
    return new AppError('conflict', 'Something else changed this at the same time; reload and try again.');
  if (code.startsWith('22')) return new AppError('invalid', 'A value is out of range or not allowed.');
  return null;
}

/** Log lines never carry query parameters (they can hold password hashes and customer details). */
function describeForLog(error: unknown): unknown {
  if (!(error instanceof Error)) return error;
  const cause = error.cause as { message?: string; code?: string } | undefined;
  const message = 'params' in error ? error.message.replace(/\nparams:[\s\S]*$/, '') : error.message;
  return {
    name: error.name,
    message,
    code: sqlState(error),
    cause: cause?.message,
    stack: error.stack
      ?.split('\n')
      .filter((line) => line.trimStart().startsWith('at '))
      .slice(0, 5)
      .join('\n'),
  };
}
