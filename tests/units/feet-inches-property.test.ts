import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatFeetInches } from '@/lib/units';

// Checked against an independent conversion: 1 in = 25.4 mm exactly (international yard and pound,
// 1959; NIST SP 811 appendix B), rounded to the nearest 1/16 in in floating point.
const independentSixteenths = (mm: number) => Math.round((mm / 25.4) * 16);

// Feet, then whole inches, then a reduced fraction: 8′-0 7/16″, 11 1/2″, 3/4″.
const SHAPE = /^(?:(\d+)′-)?(?:(\d+)(?: (\d+)\/(\d+))?|(\d+)\/(\d+))″$/;

describe('formatFeetInches', () => {
  it('keeps the zero inches between feet and a fraction', () => {
    // 2450 / 25.4 = 96.457 in = 8 ft 0.457 in; 0.457 × 16 = 7.3 → 7/16
    expect(formatFeetInches(2450)).toBe('8′-0 7/16″');
    // 3060 / 25.4 = 120.472 in = 10 ft 0.472 in → 8/16 = 1/2
    expect(formatFeetInches(3060)).toBe('10′-0 1/2″');
  });

  it('matches an independent conversion for any length, with whole inches always after feet', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000 }), (mm) => {
        const text = formatFeetInches(mm);
        const m = text.match(SHAPE);
        expect(m, text).not.toBeNull();
        const [, feet, inches, num, den, loneNum, loneDen] = m!;
        const fractionNum = Number(num ?? loneNum ?? 0);
        const fractionDen = Number(den ?? loneDen ?? 1);
        if (feet) expect(inches, `${text} keeps its whole inches`).toBeDefined();
        expect(Number(inches ?? 0)).toBeLessThan(12);
        expect(fractionNum).toBeLessThan(fractionDen);
        expect(16 % fractionDen).toBe(0);
        const sixteenths =
          Number(feet ?? 0) * 192 + Number(inches ?? 0) * 16 + (fractionNum * 16) / fractionDen;
        expect(sixteenths).toBe(independentSixteenths(mm));
      }),
    );
  });
});
