// An invented yard's sections for the import tests (not reference data).
import type { ImportOptions } from '@/lib/cut-lists';

export const yardSections: ImportOptions['sections'] = [
  { id: 'sec-47x100', name: '47x100 C24 treated', code: 'T47100' },
  { id: 'sec-38x89', name: '38x89 CLS', code: 'CLS89' },
  { id: 'sec-22x150', name: '22x150 fence board' },
];

const longest: Record<string, number | null> = { 'sec-47x100': 4800, 'sec-38x89': 3600, 'sec-22x150': null };

export const yardOptions: ImportOptions = {
  sections: yardSections,
  maxLengthMm: (id) => longest[id] ?? null,
};
