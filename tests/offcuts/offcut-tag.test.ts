import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatOffcutTag, nextOffcutTags, offcutTagNumber } from '@/lib/offcuts/offcut-tag';

describe('one offcut tag format', () => {
  it('is K- and at least four digits, and reads back to its number', () => {
    expect(formatOffcutTag(42)).toBe('K-0042');
    expect(formatOffcutTag(12345)).toBe('K-12345');
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000_000 }), (n) => {
        const tag = formatOffcutTag(n);
        expect(tag).toMatch(/^K-\d{4,}$/);
        expect(offcutTagNumber(tag)).toBe(n);
        expect(offcutTagNumber(tag.toLowerCase())).toBe(n);
      }),
    );
  });

  it('treats a yard’s own codes as not ours', () => {
    for (const code of ['OLD-7', 'Bay3/17', 'K-', 'K-12a', 'KK-0001', 'R-0001'])
      expect(offcutTagNumber(code)).toBeNull();
  });

  it('issues tags after the highest in use, never one already taken in any case', () => {
    expect(nextOffcutTags(3, [])).toEqual(['K-0001', 'K-0002', 'K-0003']);
    expect(nextOffcutTags(2, ['K-0007', 'OLD-99', 'k-0003'])).toEqual(['K-0008', 'K-0009']);
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.integer({ min: 1, max: 500 }).map(formatOffcutTag), fc.string()), {
          maxLength: 40,
        }),
        fc.integer({ min: 0, max: 30 }),
        (inUse, count) => {
          const issued = nextOffcutTags(count, inUse);
          expect(issued).toHaveLength(count);
          expect(new Set(issued).size).toBe(count);
          const taken = new Set(inUse.map((t) => t.trim().toUpperCase()));
          for (const tag of issued) {
            expect(taken.has(tag)).toBe(false);
            expect(offcutTagNumber(tag)).not.toBeNull();
          }
        },
      ),
    );
  });
});
