// A spreadsheet workbook (.xlsx) read into the tab-separated text the cut-list import takes, so a
// workbook and a pasted block go through the same checks. Runs in the browser or on the server.
import type { CellValue } from 'exceljs';

/** What a cell shows, as text: numbers as typed, rich text joined, formulas by their result. */
function cellText(value: CellValue): string {
  if (value === null || value === undefined) return '';
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if (typeof value !== 'object') return String(value);
  if ('richText' in value) return value.richText.map((r) => r.text).join('');
  if ('result' in value) return cellText((value.result ?? null) as CellValue);
  if ('text' in value) return String(value.text);
  return '';
}

/** Quotes a cell only when it holds a tab, line break or double quote. */
const tsvCell = (text: string) => (/[\t\r\n"]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text);

/** The first worksheet of an .xlsx file as tab-separated rows. */
export async function xlsxToTsv(data: ArrayBuffer): Promise<string> {
  const { default: ExcelJS } = await import('exceljs');
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(data);
  const sheet = workbook.worksheets[0];
  if (!sheet) return '';
  const lines: string[] = [];
  sheet.eachRow({ includeEmpty: true }, (row) => {
    const cells: string[] = [];
    for (let c = 1; c <= sheet.columnCount; c++) cells.push(tsvCell(cellText(row.getCell(c).value).trim()));
    lines.push(cells.join('\t'));
  });
  return lines.join('\n');
}
