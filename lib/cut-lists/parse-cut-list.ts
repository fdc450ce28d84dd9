import { MAX_TOLERANCE_MM } from '@/lib/nominal/tolerance';
import {
  createFieldCollector,
  readLengthCell,
  readQuantityCell,
  readTextCell,
  readToleranceCell,
} from './field-readers';
import { importRows } from './import-rows';
import type { ImportOptions, ImportResult } from './import-types';
import type { ColumnSpec } from './match-columns';
import { guessCutListColumns } from './guess-columns';
import { createSectionLookup } from './section-lookup';

export type CutListItem = {
  sectionId: string;
  /** Whole millimetres. */
  length: number;
  quantity: number;
  label: string | null;
  note: string | null;
  /** Nominal with no figure: the section's tolerance (else the yard's), chosen when the job is saved. */
  nominal?: boolean;
  /** Millimetres the piece may be short, when the file gives a figure; absent or 0: exact. */
  toleranceMm?: number | null;
  /** File line the row came from (header is line 1). */
  line: number;
};

export const CUT_LIST_COLUMNS: ColumnSpec[] = [
  {
    key: 'section',
    synonyms: ['section name', 'section code', 'timber', 'material', 'product'],
    required: true,
  },
  { key: 'length', synonyms: ['len', 'size', 'cut length', 'length mm'], required: true },
  { key: 'quantity', synonyms: ['qty', 'count', 'pieces', 'pcs', 'number', 'no'], required: true },
  { key: 'label', synonyms: ['name', 'mark', 'part', 'piece'], required: false },
  { key: 'note', synonyms: ['notes', 'comment', 'comments', 'remark', 'remarks'], required: false },
  // Optional: "exact", "nominal" or the millimetres a piece may be cut short.
  {
    key: 'tolerance',
    synonyms: ['nominal', 'exact or nominal', 'fit', 'length fit', 'short by', 'tolerance mm'],
    required: false,
  },
];

/**
 * Reads a cut list (CSV, or tab-separated text pasted from a spreadsheet, with or without a header
 * row when its columns are recognisable) into line items.
 * Lengths may be mm, metres or feet-inches. All or nothing: any bad row fails the import and every
 * bad row is listed with its line and column.
 */
export function parseCutList(csvText: string, options: ImportOptions): ImportResult<CutListItem> {
  const findSection = createSectionLookup(options.sections);
  return importRows({
    csvText,
    columns: CUT_LIST_COLUMNS,
    itemName: 'piece',
    guessColumns: (rows) => guessCutListColumns(rows, (text) => findSection(text).ok),
    readRow: (cell) => {
      const fields = createFieldCollector();
      const section = findSection(cell('section'));
      if (!section.ok) fields.errors.push({ column: 'section', message: section.message });
      const maxLength = section.ok ? options.maxLengthMm(section.id) : null;
      const length = fields.take(readLengthCell(cell('length'), maxLength, 'length', options.minPieceMm));
      const quantity = fields.take(readQuantityCell(cell('quantity')));
      const label = fields.take(readTextCell(cell('label'), 'label', 100));
      const note = fields.take(readTextCell(cell('note'), 'note', 500));
      const fit = fields.take(readToleranceCell(cell('tolerance'), MAX_TOLERANCE_MM));
      if (fit && length !== undefined && (fit.toleranceMm ?? 0) >= length)
        fields.errors.push({ column: 'tolerance', message: 'The tolerance must be shorter than the piece.' });
      if (!section.ok || fields.errors.length > 0) return { ok: false, errors: fields.errors };
      return {
        ok: true,
        value: {
          sectionId: section.id,
          length: length!,
          quantity: quantity!,
          label: label ?? null,
          note: note ?? null,
          ...(fit?.nominal ? fit : {}),
        },
      };
    },
  });
}
