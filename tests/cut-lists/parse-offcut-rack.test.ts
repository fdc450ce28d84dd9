import { describe, expect, it } from 'vitest';
import { OFFCUT_RACK_TEMPLATE_CSV, parseOffcutRack } from '@/lib/cut-lists';
import { yardOptions } from './yard-sections';

describe('parseOffcutRack', () => {
  it('reads the template and a good rack', () => {
    const template = parseOffcutRack(OFFCUT_RACK_TEMPLATE_CSV, {
      sections: [
        { id: 'a', name: '47x100 C24' },
        { id: 'b', name: '38x89 CLS' },
      ],
      maxLengthMm: () => 4800,
    });
    expect(template.ok).toBe(true);
    const result = parseOffcutRack(
      'Section,Length,Bay,Tag code\nCLS89,1250,A1,k-001\nT47100,"4\'-0""",A2,\n',
      yardOptions,
    );
    expect(result).toEqual({
      ok: true,
      items: [
        { sectionId: 'sec-38x89', length: 1250, location: 'A1', tag: 'k-001', line: 2 },
        // 48 in × 25.4 = 1219.2 mm (1 in = 25.4 mm exactly)
        { sectionId: 'sec-47x100', length: 1219, location: 'A2', tag: null, line: 3 },
      ],
    });
  });

  it('reports every bad row: section, length, location, repeated or malformed tags', () => {
    const csv = [
      'section,length,location,tag', // 1
      'CLS89,1250,A1,K-1', // 2 good
      'oak,1250,A1,', // 3 unknown section
      'CLS89,3700,A1,', // 4 longer than 3600
      'CLS89,900,,', // 5 no location
      'CLS89,900,A2,k-1', // 6 tag repeats line 2 (case-insensitive)
      'CLS89,900,A2,bad tag!', // 7 malformed tag
    ].join('\n');
    const result = parseOffcutRack(csv, yardOptions);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.map(({ line, column }) => [line, column])).toEqual([
        [3, 'section'],
        [4, 'length'],
        [5, 'location'],
        [6, 'tag'],
        [7, 'tag'],
      ]);
      expect(result.errors[3].message).toContain('line 2');
    }
  });

  it('needs a location column', () => {
    const result = parseOffcutRack('section,length\nCLS89,1200\n', yardOptions);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toEqual([expect.objectContaining({ line: 1, column: 'location' })]);
  });
});
