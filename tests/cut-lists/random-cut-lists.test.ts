import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCutList } from '@/lib/cut-lists';
import { formatLength } from '@/lib/units';
import { yardOptions } from './yard-sections';

// Each generated row is either good or bad in one known way; the test knows which column must be
// reported, so the set of (line, column) errors can be asserted exactly.
type RowKind = {
  cells: [string, string, string, string, string];
  bad: string | null;
  expected?: { length: number; quantity: number };
};

const goodSection = fc.constantFrom('CLS89', 'cls89', '38x89 CLS', '38 × 89 cls');
const goodMm = fc.integer({ min: 1, max: 3590 });
const goodLength = fc.oneof(
  goodMm.map((mm) => ({ text: String(mm), mm })),
  goodMm.map((mm) => ({ text: `${mm} mm`, mm })),
  goodMm.map((mm) => ({ text: `${mm / 1000} m`, mm })),
  // whole inches: n × 25.4 mm, rounded (1 in = 25.4 mm exactly); 141 in = 3581.4 mm stays under 3600
  fc.integer({ min: 1, max: 141 }).map((n) => ({ text: `${n}"`, mm: Math.round(n * 25.4) })),
  // whole feet and inches written the way we print them, e.g. 7′-8″
  fc
    .integer({ min: 12, max: 141 })
    .map((n) => ({ text: formatLength(Math.round(n * 25.4), 'imperial'), mm: Math.round(n * 25.4) })),
);
const goodQuantity = fc.integer({ min: 1, max: 10_000 });
const freeText = fc.stringMatching(/^[a-z ,"\n]{0,12}$/);

const goodRow: fc.Arbitrary<RowKind> = fc
  .tuple(goodSection, goodLength, goodQuantity, freeText, freeText)
  .map(([section, length, quantity, label, note]) => ({
    cells: [section, length.text, String(quantity), label, note],
    bad: null,
    expected: { length: length.mm, quantity },
  }));

const badRow: fc.Arbitrary<RowKind> = fc.oneof(
  fc
    .constantFrom('oak', '47x75', 'C24')
    .map((s): RowKind => ({ cells: [s, '1200', '1', '', ''], bad: 'section' })),
  fc
    .constantFrom('long', '12..3', '1/0"', '-5', '2,400', '0', '0 m', '3601', '4 m', "12'")
    .map((s): RowKind => ({ cells: ['CLS89', s, '1', '', ''], bad: 'length' })),
  fc
    .constantFrom('0', '-1', '2.5', '10001', 'x', '')
    .map((s): RowKind => ({ cells: ['CLS89', '1200', s, '', ''], bad: 'quantity' })),
);

function quote(cell: string, delimiter: string): string {
  return /["\n\r]/.test(cell) || cell.includes(delimiter) ? `"${cell.replace(/"/g, '""')}"` : cell;
}

describe('parseCutList on random files', () => {
  it('never throws and reports exactly the bad rows, each on its file line and column', () => {
    const file = fc.record({
      rows: fc.array(
        fc.tuple(fc.oneof({ weight: 3, arbitrary: goodRow }, { weight: 1, arbitrary: badRow }), fc.boolean()),
        { minLength: 1, maxLength: 40 },
      ),
      delimiter: fc.constantFrom(',', '\t', ';'),
      newline: fc.constantFrom('\n', '\r\n'),
    });
    fc.assert(
      fc.property(file, ({ rows, delimiter, newline }) => {
        const lines = [['section', 'length', 'quantity', 'label', 'note'].join(delimiter)];
        const expectedErrors: string[] = [];
        const expectedItems: Array<{ line: number; length: number; quantity: number }> = [];
        let line = 2;
        for (const [row, blankAfter] of rows) {
          const text = row.cells.map((cell) => quote(cell, delimiter)).join(delimiter);
          lines.push(text);
          if (row.bad) expectedErrors.push(`${line}:${row.bad}`);
          else expectedItems.push({ line, ...row.expected! });
          line += 1 + (text.match(/\n/g)?.length ?? 0);
          if (blankAfter) {
            lines.push('');
            line += 1;
          }
        }
        const result = parseCutList(lines.join(newline), yardOptions);
        if (expectedErrors.length === 0) {
          expect(result.ok).toBe(true);
          if (result.ok)
            expect(result.items.map(({ line, length, quantity }) => ({ line, length, quantity }))).toEqual(
              expectedItems,
            );
        } else {
          expect(result.ok).toBe(false);
          if (!result.ok) expect(result.errors.map((e) => `${e.line}:${e.column}`)).toEqual(expectedErrors);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('never throws on arbitrary text', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 300 }), (text) => {
        const result = parseCutList(`section,length,quantity\n${text}`, yardOptions);
        expect(typeof result.ok).toBe('boolean');
      }),
      { numRuns: 500 },
    );
    fc.assert(
      fc.property(fc.string({ maxLength: 300 }), (text) => {
        expect(typeof parseCutList(text, yardOptions).ok).toBe('boolean');
      }),
      { numRuns: 500 },
    );
  });
});
