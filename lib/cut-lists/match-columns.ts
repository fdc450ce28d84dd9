import type { ImportError } from './import-types';

export type ColumnSpec = { key: string; synonyms: string[]; required: boolean };

/** "Qty.", " QTY ", "quantity_required" → "qty", "qty", "quantityrequired". */
function normaliseHeader(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9]/g, '');
}

export type ColumnIndexes = Record<string, number | undefined>;

/**
 * Matches header cells to the expected columns by name or synonym, ignoring case, spaces and
 * punctuation. Unknown, repeated and missing columns are errors on line 1.
 */
export function matchColumns(
  header: string[],
  specs: ColumnSpec[],
  line: number,
): { indexes: ColumnIndexes; errors: ImportError[] } {
  const byName = new Map<string, ColumnSpec>();
  for (const spec of specs)
    for (const name of [spec.key, ...spec.synonyms]) byName.set(normaliseHeader(name), spec);

  const indexes: ColumnIndexes = {};
  const errors: ImportError[] = [];
  header.forEach((cell, index) => {
    const name = normaliseHeader(cell);
    if (name === '') return;
    const spec = byName.get(name);
    if (!spec)
      errors.push({
        line,
        column: cell.trim(),
        message: `Unknown column "${cell.trim()}". Expected: ${specs.map((s) => s.key).join(', ')}.`,
      });
    else if (indexes[spec.key] !== undefined)
      errors.push({ line, column: spec.key, message: `Column "${spec.key}" appears more than once.` });
    else indexes[spec.key] = index;
  });
  for (const spec of specs) {
    if (spec.required && indexes[spec.key] === undefined) {
      errors.push({
        line,
        column: spec.key,
        message: `Column "${spec.key}" is missing. The first line must be a header: ${specs.map((s) => s.key).join(',')}.`,
      });
    }
  }
  return { indexes, errors };
}
