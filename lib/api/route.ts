// Route handlers are declared with the action they perform; this wrapper authenticates,
// authorises, and turns every failure into a clear JSON answer (never a raw 500).
import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import { ZodError, type z } from 'zod';
import { requireUser, type CurrentUser } from '@/lib/auth/current-user';
import { isPublicAction, type Action, type PublicAction } from '@/lib/auth/permissions';
import { AppError } from '@/lib/errors';

type Context<P> = { params: Promise<P> };
// Not distributive: a route typed only by its params (A = Action) gets a signed-in user.
type UserFor<A extends Action> = [A] extends [PublicAction] ? null : CurrentUser;
type Handler<P, A extends Action> = (args: {
  req: NextRequest;
  user: UserFor<A>;
  params: P;
}) => Promise<Response>;

/** Public actions (see permissions.ts) skip sign-in and hand the handler no user. */
export function route<P = Record<string, never>, A extends Action = Action>(
  action: A,
  handler: Handler<P, A>,
) {
  return async (req: NextRequest, context: Context<P>): Promise<Response> => {
    try {
      const user = (isPublicAction(action) ? null : await requireUser(action)) as UserFor<A>;
      const params = (await context?.params) ?? ({} as P);
      return await handler({ req, user, params });
    } catch (error) {
      return errorResponse(error);
    }
  };
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
  console.error('Unhandled error in a route handler', error);
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

/** Parses a route parameter that must be a positive whole number (an id). */
export function parseId(value: string | undefined, what: string): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0) throw new AppError('not_found', `${what} was not found.`);
  return id;
}
