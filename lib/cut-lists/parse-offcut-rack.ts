import { createFieldCollector, readLengthCell, readTextCell } from './field-readers';
import { importRows } from './import-rows';
import type { ImportOptions, ImportResult } from './import-types';
import type { ColumnSpec } from './match-columns';
import { createSectionLookup } from './section-lookup';

export type OffcutRackItem = {
  sectionId: string;
  /** Whole millimetres. */
  length: number;
  location: string;
  /** The yard's existing tag code, or null to have one issued. */
  tag: string | null;
  line: number;
};

export const OFFCUT_RACK_COLUMNS: ColumnSpec[] = [
  {
    key: 'section',
    synonyms: ['section name', 'section code', 'timber', 'material', 'product'],
    required: true,
  },
  { key: 'length', synonyms: ['len', 'size', 'length mm'], required: true },
  { key: 'location', synonyms: ['loc', 'rack', 'bay', 'shelf', 'position', 'place'], required: true },
  { key: 'tag', synonyms: ['tag code', 'code', 'id'], required: false },
];

const TAG_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._-]{0,31}$/;

/**
 * Reads an existing offcut rack (one row per physical offcut) with the same all-or-nothing
 * rules as a cut list. Tags, when given, must be unique within the file.
 */
export function parseOffcutRack(csvText: string, options: ImportOptions): ImportResult<OffcutRackItem> {
  const findSection = createSectionLookup(options.sections);
  const tagLines = new Map<string, number>();
  return importRows({
    csvText,
    columns: OFFCUT_RACK_COLUMNS,
    itemName: 'offcut',
    readRow: (cell, line) => {
      const fields = createFieldCollector();
      const section = findSection(cell('section'));
      if (!section.ok) fields.errors.push({ column: 'section', message: section.message });
      const length = fields.take(
        readLengthCell(cell('length'), section.ok ? options.maxLengthMm(section.id) : null),
      );
      const location = fields.take(readTextCell(cell('location'), 'location', 60, true));
      const tag = fields.take(readTextCell(cell('tag'), 'tag', 32));
      if (tag) {
        const key = tag.toUpperCase();
        if (!TAG_PATTERN.test(tag))
          fields.errors.push({
            column: 'tag',
            message: `Tag "${tag}" may use only letters, digits, dots, dashes and underscores.`,
          });
        else if (tagLines.has(key))
          fields.errors.push({
            column: 'tag',
            message: `Tag "${tag}" is already used on line ${tagLines.get(key)}.`,
          });
        else tagLines.set(key, line);
      }
      if (!section.ok || fields.errors.length > 0) return { ok: false, errors: fields.errors };
      return {
        ok: true,
        value: { sectionId: section.id, length: length!, location: location!, tag: tag ?? null },
      };
    },
  });
}
