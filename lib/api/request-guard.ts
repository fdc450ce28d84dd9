// Checks every API request before its handler runs: cross-site writes are refused (Origin and
// Content-Type), bodies are capped in size, and NUL characters never reach the database.
import 'server-only';
import { NextRequest } from 'next/server';
import { getEnv } from '@/lib/env';
import { AppError } from '@/lib/errors';

/** What a state-changing route accepts as its body. */
export type BodyKind = 'json' | 'csv';

export const JSON_BODY_LIMIT_BYTES = 1024 * 1024;
export const CSV_BODY_LIMIT_BYTES = 5 * 1024 * 1024;

const ACCEPTED_TYPES: Record<BodyKind, readonly string[]> = {
  json: ['application/json'],
  csv: ['text/csv', 'text/tab-separated-values', 'application/csv', 'application/vnd.ms-excel'],
};

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export type GuardOptions = { body?: BodyKind; maxBytes?: number };

/**
 * Returns the request the handler should see (with its body read once, within the size limit),
 * or throws an AppError (403 cross-site, 415 wrong type, 413 too large, 422 NUL character).
 */
export async function guardRequest(req: NextRequest, options: GuardOptions = {}): Promise<NextRequest> {
  refuseNulInQuery(req);
  if (SAFE_METHODS.has(req.method)) return req;
  refuseCrossSite(req);
  const kind = options.body ?? 'json';
  const limit = options.maxBytes ?? (kind === 'csv' ? CSV_BODY_LIMIT_BYTES : JSON_BODY_LIMIT_BYTES);
  const declared = Number(req.headers.get('content-length') ?? 0);
  if (declared > limit) throw tooLarge(limit);
  const bytes = await readCapped(req, limit);
  const type = mediaType(req.headers.get('content-type'));
  // A bare POST from a button has no body and may have no type; any body must have our type,
  // which also keeps plain HTML forms (urlencoded, text/plain, multipart) from another site out.
  if ((bytes.length > 0 || type !== '') && !ACCEPTED_TYPES[kind].includes(type)) {
    throw new AppError(
      'unsupported',
      kind === 'csv'
        ? 'Send the file as CSV text (Content-Type: text/csv).'
        : 'Send the request as JSON (Content-Type: application/json).',
    );
  }
  const text = new TextDecoder().decode(bytes);
  if (hasNul(text, kind)) throw nulError();
  return new NextRequest(req.url, { method: req.method, headers: req.headers, body: text });
}

function mediaType(header: string | null): string {
  return (header ?? '').split(';')[0].trim().toLowerCase();
}

/** The app's own origins: NEXTAUTH_URL when set, and the address the request was sent to. */
function ownOrigins(req: NextRequest): string[] {
  const origins = [req.nextUrl.origin];
  const host = req.headers.get('host');
  if (host) origins.push(`${req.nextUrl.protocol}//${host}`);
  const configured = getEnv().NEXTAUTH_URL;
  if (configured) origins.push(new URL(configured).origin);
  return origins;
}

function refuseCrossSite(req: NextRequest): void {
  const origin = req.headers.get('origin');
  const fetchSite = req.headers.get('sec-fetch-site');
  // Browsers send Origin on every cross-origin write; scripts and tests without one are not browsers.
  const foreign =
    (origin !== null && !ownOrigins(req).includes(origin)) ||
    fetchSite === 'cross-site' ||
    fetchSite === 'same-site';
  if (foreign) {
    throw new AppError('forbidden', 'This request came from another site and was refused.');
  }
}

async function readCapped(req: NextRequest, limit: number): Promise<Uint8Array> {
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel();
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return bytes;
}

/** A NUL in raw text, or a JSON string escape that decodes to one (Postgres text cannot hold it). */
function hasNul(text: string, kind: BodyKind): boolean {
  if (text.includes('\u0000')) return true;
  if (kind !== 'json' || !/\\u0000/i.test(text)) return false;
  try {
    let found = false;
    JSON.parse(text, (key, value) => {
      if (key.includes('\u0000') || (typeof value === 'string' && value.includes('\u0000'))) found = true;
      return value;
    });
    return found;
  } catch {
    return false; // not JSON at all: the handler answers that
  }
}

function refuseNulInQuery(req: NextRequest): void {
  for (const [key, value] of req.nextUrl.searchParams) {
    if (key.includes('\u0000') || value.includes('\u0000')) throw nulError();
  }
}

const nulError = () => new AppError('invalid', 'Text may not contain NUL characters.');

const tooLarge = (limit: number) =>
  new AppError('too_large', `The request is larger than ${Math.round(limit / 1024)} KB.`);
