import { parseLength } from '@/lib/units';
import type { ColumnIndexes } from './match-columns';

/** How many rows are looked at to recognise the columns of a block pasted without a header. */
const SAMPLE = 200;
/** Without a header, a column is taken for lengths only if every length is at least this (mm). */
const SHORTEST_RECOGNISED_MM = 100;

const isWholeCount = (text: string) =>
  /^\d+$/.test(text.trim()) && Number(text) >= 1 && Number(text) <= 10_000;

/**
 * Recognises the columns of a cut list pasted without a header: a column whose every cell is a known
 * section, a count column and a length column told apart without doubt (every length at least
 * 100 mm and longer than every count), then up to two text columns for label and note. Answers null when any of that is
 * unclear: the yard hand adds a header rather than the importer guessing.
 */
export function guessCutListColumns(
  rows: string[][],
  isSection: (text: string) => boolean,
): ColumnIndexes | null {
  const sample = rows.slice(0, SAMPLE);
  const width = Math.max(...sample.map((r) => r.length));
  const column = (i: number) => sample.map((r) => (r[i] ?? '').trim());
  const all = (i: number, test: (cell: string) => boolean) => column(i).every((c) => c !== '' && test(c));
  const indexes = [...Array(width).keys()];

  const section = indexes.find((i) => all(i, isSection));
  if (section === undefined) return null;
  const numeric = indexes.filter((i) => i !== section && all(i, (c) => parseLength(c).ok));
  const counts = numeric.filter((i) => all(i, isWholeCount));
  if (numeric.length !== 2 || counts.length === 0) return null;
  const lengthMm = (i: number) => column(i).map((c) => (parseLength(c) as { mm: number }).mm);
  const [a, b] = numeric;
  const quantity =
    counts.length === 1 ? counts[0] : Math.max(...lengthMm(a)) < Math.min(...lengthMm(b)) ? a : b;
  const length = quantity === a ? b : a;
  const shortest = Math.min(...lengthMm(length));
  if (shortest < SHORTEST_RECOGNISED_MM || Math.max(...lengthMm(quantity)) >= shortest) return null;
  const [label, note] = indexes.filter((i) => i !== section && i !== quantity && i !== length);
  return { section, length, quantity, label, note };
}
