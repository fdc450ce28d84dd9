import Papa from 'papaparse';

export type CsvRow = { cells: string[]; line: number };
export type CsvProblem = { line: number; message: string };

/**
 * Spreadsheets paste tab-separated text; some locales save with semicolons. The header line decides,
 * which is steadier than guessing from the data (lengths like 7'-8 5/8" are full of odd characters).
 */
export function detectDelimiter(text: string): string {
  const header = text.split(/\r\n|\n|\r/).find((line) => line.trim() !== '') ?? '';
  if (header.includes('\t')) return '\t';
  const count = (char: string) => header.split(char).length - 1;
  return count(';') > count(',') ? ';' : ',';
}

function countLineBreaks(cells: string[], linebreak: string): number {
  const mark = linebreak === '\r' ? '\r' : '\n';
  let breaks = 0;
  for (const cell of cells) {
    if (!cell.includes(mark)) continue;
    for (const char of cell) if (char === mark) breaks += 1;
  }
  return breaks;
}

/**
 * Splits CSV or TSV text into rows, keeping the file line each row starts on (quoted cells may span
 * lines). Blank rows are dropped. Quote problems are reported against their line.
 */
export function readCsvRows(text: string): { rows: CsvRow[]; problems: CsvProblem[] } {
  const body = text.replace(/^\ufeff/, '');
  const parsed = Papa.parse<string[]>(body, { delimiter: detectDelimiter(body), skipEmptyLines: false });
  const rows: CsvRow[] = [];
  const lineOfRow: number[] = [];
  let line = 1;
  for (const cells of parsed.data) {
    lineOfRow.push(line);
    if (cells.some((cell) => cell.trim() !== '')) rows.push({ cells, line });
    line += 1 + countLineBreaks(cells, parsed.meta.linebreak);
  }
  const problems = parsed.errors.map((error) => ({
    line: lineOfRow[error.row ?? 0] ?? 1,
    message:
      error.code === 'MissingQuotes'
        ? 'A quoted cell is never closed: check the double quotes.'
        : error.message,
  }));
  return { rows, problems };
}
