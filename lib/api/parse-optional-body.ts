import 'server-only';
import type { z } from 'zod';
import { AppError } from '@/lib/errors';

/** Like parseJsonBody, but an empty body counts as `{}` (a bare POST from a button). */
export async function parseOptionalJsonBody<S extends z.ZodType>(
  req: Request,
  schema: S,
): Promise<z.infer<S>> {
  const text = await req.text();
  let body: unknown = {};
  if (text.trim()) {
    try {
      body = JSON.parse(text);
    } catch {
      throw new AppError('invalid', 'The request body must be JSON.');
    }
  }
  return schema.parse(body);
}
