import type { ImportError, ImportResult, RowResult } from './import-types';
import { matchColumns, type ColumnIndexes, type ColumnSpec } from './match-columns';
import { readCsvRows } from './read-csv-rows';

/** Far more than any cut list; stops a wrong file from tying up the server. */
export const MAX_ROWS = 50_000;

export type RowCells = (key: string) => string;

type ImportRowsInput<T> = {
  csvText: string;
  columns: ColumnSpec[];
  /** What one item is called in messages, e.g. "piece" or "offcut". */
  itemName: string;
  readRow: (cell: RowCells, line: number) => RowResult<T>;
  /** Recognises the columns of rows pasted without a header; null when they are not clear. */
  guessColumns?: (rows: string[][]) => ColumnIndexes | null;
};

/**
 * The shared machinery of every CSV import: split rows, match the header, read each row, and
 * return all items or every problem found, in line order.
 */
export function importRows<T>({
  csvText,
  columns,
  itemName,
  readRow,
  guessColumns,
}: ImportRowsInput<T>): ImportResult<T & { line: number }> {
  if (typeof csvText !== 'string' || csvText.trim() === '') {
    return { ok: false, errors: [{ line: 1, column: null, message: 'The file is empty.' }] };
  }
  const { rows, problems } = readCsvRows(csvText);
  const errors: ImportError[] = problems.map((problem) => ({ ...problem, column: null }));
  const [header] = rows;
  if (!header) return { ok: false, errors: [{ line: 1, column: null, message: 'The file is empty.' }] };
  let body = rows.slice(1);
  let { indexes, errors: headerErrors } = matchColumns(header.cells, columns, header.line);
  // No header at all (no cell names a column): rows pasted straight from a spreadsheet.
  const noHeader = headerErrors.length > 0 && Object.keys(indexes).length === 0;
  const guessed = noHeader && guessColumns ? guessColumns(rows.map((r) => r.cells)) : null;
  if (guessed) {
    [indexes, headerErrors, body] = [guessed, [], rows];
  }
  if (headerErrors.length > 0) return { ok: false, errors: [...headerErrors, ...errors] };
  if (body.length === 0)
    errors.push({
      line: header.line,
      column: null,
      message: `The file has a header but no ${itemName} rows.`,
    });
  if (body.length > MAX_ROWS) {
    return {
      ok: false,
      errors: [
        {
          line: body[MAX_ROWS].line,
          column: null,
          message: `The file has more than ${MAX_ROWS} rows; split it.`,
        },
      ],
    };
  }

  const width = guessed
    ? Math.max(...rows.map((r) => r.cells.length))
    : Math.max(...Object.values(indexes).map((index) => (index ?? 0) + 1), header.cells.length);
  const items: Array<T & { line: number }> = [];
  for (const row of body) {
    if (row.cells.slice(width).some((cell) => cell.trim() !== '')) {
      errors.push({
        line: row.line,
        column: null,
        message: 'This row has more cells than the header; put text that contains commas in double quotes.',
      });
      continue;
    }
    const cell: RowCells = (key) => {
      const index = indexes[key];
      return index === undefined ? '' : (row.cells[index] ?? '');
    };
    const result = readRow(cell, row.line);
    if (result.ok) items.push({ ...result.value, line: row.line });
    else for (const error of result.errors) errors.push({ line: row.line, ...error });
  }
  if (errors.length > 0) return { ok: false, errors: errors.sort((a, b) => a.line - b.line) };
  return { ok: true, items };
}
