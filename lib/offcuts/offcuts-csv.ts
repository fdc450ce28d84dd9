// The rack as CSV; the first four columns are the ones the rack import reads, so an export can be re-imported.
import Papa from 'papaparse';

export type ExportedOffcut = {
  tag: string;
  sectionName: string;
  lengthMm: number;
  location: string;
  status: string;
  origin: string;
  createdAt: Date;
};

export function offcutsToCsv(rows: ExportedOffcut[]): string {
  // escapeFormulae: a cell starting with = + - @ (or a tab/CR) gets a leading ' so a spreadsheet
  // shows it as text instead of running it (OWASP "CSV Injection").
  return Papa.unparse(
    {
      fields: ['section', 'length', 'location', 'tag', 'status', 'origin', 'made'],
      data: rows.map((o) => [
        o.sectionName,
        o.lengthMm,
        o.location,
        o.tag,
        o.status,
        o.origin,
        o.createdAt.toISOString().slice(0, 10),
      ]),
    },
    { escapeFormulae: true },
  );
}
