import { formatMillimetres, parseLength, shortPieceMessage } from '@/lib/units';
import type { FieldError } from './import-types';

export const MAX_QUANTITY = 10_000;

type Read<T> = { ok: true; value: T } | { ok: false; error: FieldError };

const fail = (column: string, message: string): Read<never> => ({ ok: false, error: { column, message } });

/**
 * A length in any notation lib/units reads, more than 0 (at least `minSafeMm` when given: the yard's
 * minimum safe piece length) and no longer than the section's longest board.
 */
export function readLengthCell(
  text: string,
  maxLengthMm: number | null,
  column = 'length',
  minSafeMm?: number,
): Read<number> {
  const parsed = parseLength(text);
  if (!parsed.ok) return fail(column, parsed.message);
  const short = minSafeMm ? shortPieceMessage({ mm: parsed.mm, minSafeMm, typed: text }) : null;
  if (short) return fail(column, short);
  if (parsed.mm <= 0) return fail(column, 'Length must be more than 0.');
  if (maxLengthMm !== null && parsed.mm > maxLengthMm) {
    return fail(
      column,
      `Length ${formatMillimetres(parsed.mm)} mm is longer than any stock length or offcut of this section (longest ${formatMillimetres(maxLengthMm)} mm).`,
    );
  }
  return { ok: true, value: parsed.mm };
}

/** A whole number of pieces from 1 to 10 000. */
export function readQuantityCell(text: string, column = 'quantity'): Read<number> {
  const trimmed = text.trim();
  if (trimmed === '') return fail(column, 'Quantity is missing.');
  if (!/^[+-]?\d*\.?\d+$/.test(trimmed)) return fail(column, `Quantity "${trimmed}" is not a number.`);
  const value = Number(trimmed);
  if (!Number.isInteger(value)) return fail(column, `Quantity must be a whole number, not ${trimmed}.`);
  if (value <= 0) return fail(column, 'Quantity must be at least 1.');
  if (value > MAX_QUANTITY)
    return fail(column, `Quantity must be at most ${formatMillimetres(MAX_QUANTITY)}.`);
  return { ok: true, value };
}

const NOMINAL_WORDS = new Set(['nominal', 'nom', 'n', 'yes', 'y', 'short ok']);
const EXACT_WORDS = new Set(['exact', 'e', 'no', 'x']);

/**
 * Exact or nominal: blank or "exact" is exact; "nominal" takes the section's tolerance (else the
 * yard's); a number of millimetres ("5", "5 mm") is that tolerance, 0 meaning exact.
 */
export function readToleranceCell(
  text: string,
  maxMm: number,
  column = 'tolerance',
): Read<{ nominal: boolean; toleranceMm: number | null }> {
  const word = text.trim().toLowerCase().replace(/\s+/g, ' ');
  if (word === '' || EXACT_WORDS.has(word)) return { ok: true, value: { nominal: false, toleranceMm: 0 } };
  if (NOMINAL_WORDS.has(word)) return { ok: true, value: { nominal: true, toleranceMm: null } };
  const mm = /^(\d+)\s*(mm)?$/.exec(word);
  if (!mm)
    return fail(
      column,
      `"${text.trim()}" is not exact, nominal or a number of millimetres the piece may be short.`,
    );
  const value = Number(mm[1]);
  if (value > maxMm)
    return fail(column, `A nominal piece may be at most ${maxMm} mm short, not ${value} mm.`);
  return { ok: true, value: { nominal: value > 0, toleranceMm: value } };
}

/** Free text, trimmed; blank becomes null. */
export function readTextCell(
  text: string,
  column: string,
  maxChars: number,
  required = false,
): Read<string | null> {
  const trimmed = text.trim();
  if (trimmed === '')
    return required
      ? fail(column, `${column[0].toUpperCase()}${column.slice(1)} is missing.`)
      : { ok: true, value: null };
  if (trimmed.length > maxChars)
    return fail(
      column,
      `${column[0].toUpperCase()}${column.slice(1)} is longer than ${maxChars} characters.`,
    );
  return { ok: true, value: trimmed };
}

/** Collects field errors while reading one row, so every bad cell of the row is reported. */
export function createFieldCollector() {
  const errors: FieldError[] = [];
  return {
    errors,
    take<T>(read: Read<T>): T | undefined {
      if (read.ok) return read.value;
      errors.push(read.error);
      return undefined;
    },
  };
}
