import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatLength, lengthInputSchema, parseLength } from '@/lib/units';

const lengths = fc.integer({ min: 0, max: 1_000_000 });

describe('round trips', () => {
  it('metric formatting then parsing gives the same millimetres exactly', () => {
    fc.assert(
      fc.property(lengths, (mm) => {
        expect(parseLength(formatLength(mm, 'mm'))).toEqual({ ok: true, mm });
      }),
    );
  });

  it('imperial formatting then parsing is within 1 mm (1/16 in display, i.e. 1/32 in = 0.79 mm error)', () => {
    fc.assert(
      fc.property(lengths, (mm) => {
        const back = parseLength(formatLength(mm, 'imperial'));
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.mm - mm)).toBeLessThanOrEqual(1);
      }),
    );
  });

  it('whole sixteenths of an inch written as feet-inches parse to the exact rounded millimetres', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 50 }),
        fc.integer({ min: 0, max: 11 }),
        fc.integer({ min: 0, max: 15 }),
        (feet, inches, sixteenths) => {
          const text = `${feet}' ${inches} ${sixteenths}/16"`;
          const totalInches = feet * 12 + inches + sixteenths / 16;
          // sixteenths × 25.4 / 16 has at most 4 decimals, so toFixed keeps this reference exact
          const expected = Math.round(Number((totalInches * 25.4).toFixed(6)));
          const result = parseLength(sixteenths === 0 ? `${feet}' ${inches}"` : text);
          expect(result).toEqual({ ok: true, mm: expected });
        },
      ),
    );
  });

  it('parseLength never throws on arbitrary strings', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.string({ unit: 'grapheme' }),
          fc.stringMatching(/^[0-9 '"\-/.,mftin′″]{0,30}$/),
        ),
        (text) => {
          const result = parseLength(text);
          expect(typeof result.ok).toBe('boolean');
          if (result.ok) expect(Number.isInteger(result.mm) && result.mm >= 0).toBe(true);
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('lengthInputSchema', () => {
  it('accepts whole millimetres as a number and any notation as text', () => {
    expect(lengthInputSchema.parse(2400)).toBe(2400);
    expect(lengthInputSchema.parse('2.4 m')).toBe(2400);
    expect(lengthInputSchema.parse('92 5/8"')).toBe(2353);
  });

  it('refuses zero, fractions of a millimetre and nonsense with the parser message', () => {
    expect(lengthInputSchema.safeParse(0).success).toBe(false);
    expect(lengthInputSchema.safeParse(12.5).success).toBe(false);
    expect(lengthInputSchema.safeParse(true).success).toBe(false);
    const bad = lengthInputSchema.safeParse('2,400');
    expect(bad.success).toBe(false);
    if (!bad.success) expect(bad.error.issues[0].message).toMatch(/comma/);
  });
});
