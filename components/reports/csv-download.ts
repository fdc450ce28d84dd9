import Papa from 'papaparse';

export type Column<T> = {
  key: keyof T & string;
  label: string;
  format?: (value: T[keyof T], row: T) => string;
};

/** Builds a CSV of exactly the rows and columns a table shows, with raw numbers (mm, pence). */
export function rowsToCsv<T>(rows: T[], columns: Column<T>[]): string {
  return Papa.unparse({
    fields: columns.map((c) => c.label),
    data: rows.map((r) => columns.map((c) => r[c.key] as unknown as string)),
  });
}

export function downloadCsv(fileName: string, csv: string): void {
  const url = URL.createObjectURL(new Blob([csv], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  URL.revokeObjectURL(url);
}
