// Cut lists as people really bring them: a workbook, a block pasted without its header, and a
// section written the way it is asked for at the counter.
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { parseCutList } from '@/lib/cut-lists';
import { nearestSection } from '@/lib/cut-lists/nearest-section';
import { xlsxToTsv } from '@/lib/cut-lists/read-xlsx';
import { yardOptions, yardSections } from './yard-sections';

describe('reading an .xlsx workbook', () => {
  it('reads the first sheet as the rows a CSV would give, numbers, text and formula results alike', async () => {
    // A workbook written by the exceljs library (Office Open XML, ECMA-376), as a spreadsheet saves it.
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Cut list');
    sheet.addRow(['Section', 'Length', 'Qty', 'Label']);
    sheet.addRow(['T47100', 2400, 9, 'stud']);
    sheet.addRow(['38x89 CLS', '7′-8 5/8″', { formula: '2*2', result: 4 }, 'noggin, short']);
    workbook.addWorksheet('Notes').addRow(['not read']);
    const data = (await workbook.xlsx.writeBuffer()) as ArrayBuffer;

    const text = await xlsxToTsv(data);
    expect(text.split('\n')[0]).toBe('Section\tLength\tQty\tLabel');
    expect(parseCutList(text, yardOptions)).toEqual({
      ok: true,
      items: [
        { sectionId: 'sec-47x100', length: 2400, quantity: 9, label: 'stud', note: null, line: 2 },
        // 7 ft 8 5/8 in = 92.625 in × 25.4 = 2352.7 mm, rounded to 2353 (1 in = 25.4 mm exactly).
        { sectionId: 'sec-38x89', length: 2353, quantity: 4, label: 'noggin, short', note: null, line: 3 },
      ],
    });
  });

  it('refuses a file that is not a workbook', async () => {
    await expect(
      xlsxToTsv(new TextEncoder().encode('section,length\n').buffer as ArrayBuffer),
    ).rejects.toThrow();
  });
});

describe('a block pasted without a header', () => {
  it('is read when its columns are recognisable', () => {
    const pasted = ['T47100\t2400\t9\tstud', '38x89 CLS\t600\t12\tnoggin'].join('\n');
    expect(parseCutList(pasted, yardOptions)).toEqual({
      ok: true,
      items: [
        { sectionId: 'sec-47x100', length: 2400, quantity: 9, label: 'stud', note: null, line: 1 },
        { sectionId: 'sec-38x89', length: 600, quantity: 12, label: 'noggin', note: null, line: 2 },
      ],
    });
  });

  it('finds the count and the length in either order', () => {
    const result = parseCutList('4\t2.4 m\tT47100\n2\t3000\tT47100', yardOptions);
    expect(result.ok && result.items.map((i) => [i.length, i.quantity])).toEqual([
      [2400, 4],
      [3000, 2],
    ]);
  });

  it('is refused, asking for a header, when count and length cannot be told apart', () => {
    const result = parseCutList('T47100\t12\t10\nT47100\t20\t8', yardOptions);
    expect(result.ok).toBe(false);
    if (!result.ok)
      expect(result.errors.some((e) => /The first line must be a header/.test(e.message))).toBe(true);
  });
});

describe('an unknown section', () => {
  // "4x2" is the UK counter name for 47×100 (nominal inches, regularised): common practice, no
  // published source.
  it('suggests the section of the same size with the most words in common', () => {
    expect(nearestSection('4x2 treated', yardSections)?.code).toBe('T47100');
    expect(nearestSection('100 x 47', yardSections)?.code).toBe('T47100');
    expect(nearestSection('89x38 cls', yardSections)?.code).toBe('CLS89');
    expect(nearestSection('6x1 board', yardSections)?.name).toBe('22x150 fence board');
  });

  it('suggests nothing when no section has that size', () => {
    expect(nearestSection('9x3 joist', yardSections)).toBeNull();
    expect(nearestSection('treated', yardSections)).toBeNull();
  });

  it('names the suggestion in the import error', () => {
    const result = parseCutList('section,length,quantity\n4x2 treated,2400,2', yardOptions);
    expect(result.ok).toBe(false);
    if (!result.ok)
      expect(result.errors[0].message).toBe(
        'Unknown section "4x2 treated". Did you mean 47x100 C24 treated (T47100)?',
      );
  });
});
