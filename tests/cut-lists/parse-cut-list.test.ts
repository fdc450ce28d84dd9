import { describe, expect, it } from 'vitest';
import { CUT_LIST_TEMPLATE_CSV, parseCutList, type ImportResult } from '@/lib/cut-lists';
import { yardOptions } from './yard-sections';

function errorsOf<T>(result: ImportResult<T>) {
  if (result.ok) throw new Error('expected the import to fail');
  return result.errors.map(({ line, column }) => ({ line, column }));
}

describe('parseCutList: good files', () => {
  it('reads the downloadable template', () => {
    const result = parseCutList(CUT_LIST_TEMPLATE_CSV, {
      sections: [
        { id: 'a', name: '47x100 C24' },
        { id: 'b', name: '38x89 CLS' },
      ],
      maxLengthMm: () => 4800,
    });
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.items.length).toBeGreaterThan(2);
  });

  it('reads every notation and matches sections by name or code, ignoring case and × spacing', () => {
    const csv = [
      'section,length,quantity,label,note',
      '47x100 C24 treated,2400,9,stud,',
      't47100,2.4 m,2,plate,head and sole',
      '38 × 89 cls,"92 5/8""",4,,',
      'CLS89,7′-8 5/8″,1,king stud,',
    ].join('\n');
    const result = parseCutList(csv, yardOptions);
    expect(result).toEqual({
      ok: true,
      items: [
        { sectionId: 'sec-47x100', length: 2400, quantity: 9, label: 'stud', note: null, line: 2 },
        {
          sectionId: 'sec-47x100',
          length: 2400,
          quantity: 2,
          label: 'plate',
          note: 'head and sole',
          line: 3,
        },
        // 92 5/8 in = 2352.675 mm → 2353 (1 in = 25.4 mm; precut stud, common practice)
        { sectionId: 'sec-38x89', length: 2353, quantity: 4, label: null, note: null, line: 4 },
        { sectionId: 'sec-38x89', length: 2353, quantity: 1, label: 'king stud', note: null, line: 5 },
      ],
    });
  });

  it('matches header synonyms loosely and in any order', () => {
    const csv = 'Qty , Len, Mark,Comments,SECTION\n3,1200,nog,,CLS89\n';
    const result = parseCutList(csv, yardOptions);
    expect(result).toEqual({
      ok: true,
      items: [{ sectionId: 'sec-38x89', length: 1200, quantity: 3, label: 'nog', note: null, line: 2 }],
    });
  });

  it('reads tab-separated text pasted from a spreadsheet, with a byte-order mark and CRLF', () => {
    const tsv = "\ufeffSection\tSize\tPieces\tName\r\nCLS89\t3600\t2\ttop plate\r\n\r\nCLS89\t8'\t1\t\r\n";
    const result = parseCutList(tsv, yardOptions);
    expect(result.ok).toBe(true);
    if (result.ok)
      expect(result.items.map((item) => [item.line, item.length])).toEqual([
        [2, 3600],
        [4, 2438],
      ]);
  });

  it('reads semicolon-separated files', () => {
    const result = parseCutList('section;length;quantity\nCLS89;1200;2\n', yardOptions);
    expect(result.ok).toBe(true);
  });

  it('counts file lines through quoted notes that span lines', () => {
    const csv = 'section,length,quantity,note\nCLS89,1200,2,"first line\nsecond line"\nCLS89,oops,2,\n';
    expect(errorsOf(parseCutList(csv, yardOptions))).toEqual([{ line: 4, column: 'length' }]);
  });

  it('checks no maximum when the section has none', () => {
    const result = parseCutList('section,length,quantity\n22x150 fence board,20000,1\n', yardOptions);
    expect(result.ok).toBe(true);
  });
});

describe('parseCutList: bad files', () => {
  it('reports every bad row with its line and column', () => {
    const csv = [
      'section,length,quantity,label,note', // 1
      '47x100 oak,2400,1,,', // 2 unknown section
      'CLS89,long,1,,', // 3 not a number
      'CLS89,0,1,,', // 4 zero
      'CLS89,-300,1,,', // 5 negative
      'CLS89,3601,1,,', // 6 longer than the longest (3600)
      'CLS89,1200,10001,,', // 7 too many
      'CLS89,1200,2.5,,', // 8 not whole
      'CLS89,1200,0,,', // 9 zero quantity
      'CLS89,1200,,,', // 10 missing quantity
      'CLS89,1200,2,,', // 11 good
      ',1200,2,,', // 12 missing section
      'CLS89,1200,two,,', // 13 quantity not a number
      'CLS89,"2,400",2,,', // 14 comma in length
      'nope,nope,nope,,', // 15 three errors
    ].join('\n');
    expect(errorsOf(parseCutList(csv, yardOptions))).toEqual([
      { line: 2, column: 'section' },
      { line: 3, column: 'length' },
      { line: 4, column: 'length' },
      { line: 5, column: 'length' },
      { line: 6, column: 'length' },
      { line: 7, column: 'quantity' },
      { line: 8, column: 'quantity' },
      { line: 9, column: 'quantity' },
      { line: 10, column: 'quantity' },
      { line: 12, column: 'section' },
      { line: 13, column: 'quantity' },
      { line: 14, column: 'length' },
      { line: 15, column: 'section' },
      { line: 15, column: 'length' },
      { line: 15, column: 'quantity' },
    ]);
  });

  it('explains a length over the longest board with both lengths', () => {
    const result = parseCutList('section,length,quantity\nT47100,5.4 m,1\n', yardOptions);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0].message).toContain('4800');
  });

  it('refuses an empty file, a header alone, and whitespace', () => {
    for (const text of ['', '   \n\n', ',,,\n'])
      expect(errorsOf(parseCutList(text, yardOptions))).toEqual([{ line: 1, column: null }]);
    expect(errorsOf(parseCutList('section,length,quantity\n', yardOptions))).toEqual([
      { line: 1, column: null },
    ]);
  });

  it('refuses missing, unknown and repeated columns', () => {
    expect(errorsOf(parseCutList('section,length\nCLS89,1200\n', yardOptions))).toEqual([
      { line: 1, column: 'quantity' },
    ]);
    expect(errorsOf(parseCutList('section,length,quantity,price\nCLS89,1200,1,4\n', yardOptions))).toEqual([
      { line: 1, column: 'price' },
    ]);
    expect(errorsOf(parseCutList('section,length,qty,count\nCLS89,1200,1,4\n', yardOptions))).toEqual([
      { line: 1, column: 'quantity' },
    ]);
  });

  it('refuses a file without a header row when its columns are not recognisable', () => {
    // Recognisable headerless rows are read (tests/cut-lists/import-helpers.test.ts); 12 and 2 could
    // each be the count or the length, so this one needs a header.
    const result = errorsOf(parseCutList('CLS89,12,2\n', yardOptions));
    expect(result.every((error) => error.line === 1)).toBe(true);
    expect(result.length).toBeGreaterThan(0);
  });

  it('refuses a row with more cells than the header', () => {
    expect(
      errorsOf(parseCutList('section,length,quantity,note\nCLS89,1200,2,left, then right\n', yardOptions)),
    ).toEqual([{ line: 2, column: null }]);
  });

  it('refuses a section name shared by two sections', () => {
    const options = {
      sections: [
        { id: 'a', name: 'CLS' },
        { id: 'b', name: '38x63', code: 'cls' },
      ],
      maxLengthMm: () => null,
    };
    expect(errorsOf(parseCutList('section,length,quantity\ncls,1200,2\n38x63,1200,1\n', options))).toEqual([
      { line: 2, column: 'section' },
    ]);
  });

  it('reports an unclosed quote', () => {
    const result = parseCutList('section,length,quantity,note\nCLS89,1200,2,"never closed\n', yardOptions);
    expect(errorsOf(result)).toContainEqual({ line: 2, column: null });
  });
});
