// The one way a page turns an id in its address into a record: a malformed or missing id shows the
// route group's not-found page (404), a refusal stays a 403, anything else reaches error.tsx.
import 'server-only';
import { forbidden, notFound } from 'next/navigation';
import { parseId } from '@/lib/api/route';
import { AppError } from '@/lib/errors';

export async function findOrNotFound<T>(rawId: string, read: (id: number) => Promise<T>): Promise<T> {
  let id: number;
  try {
    id = parseId(rawId, 'That page');
  } catch {
    notFound();
  }
  try {
    return await read(id);
  } catch (e) {
    if (e instanceof AppError && e.code === 'not_found') notFound();
    if (e instanceof AppError && e.code === 'forbidden') forbidden();
    throw e;
  }
}
