export type ParseLengthResult = { ok: true; mm: number } | { ok: false; message: string };

export function lengthError(message: string): ParseLengthResult {
  return { ok: false, message };
}
