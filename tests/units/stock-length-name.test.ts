import { describe, expect, it } from 'vitest';
import { stockLengthName } from '@/lib/units/stock-length-name';

describe('stock length names by region', () => {
  it('names UK stock in metres with one decimal', () => {
    // UK customary lengths 2.4 m to 6.0 m in 0.3 m steps: BS EN 1313-1 National Annex table NA.2
    // (values from memory), written "4.8 m" by merchants (common practice, no published source).
    expect([2400, 3000, 4800, 6000].map((mm) => stockLengthName(mm, 'uk'))).toEqual([
      '2.4 m',
      '3.0 m',
      '4.8 m',
      '6.0 m',
    ]);
    expect(stockLengthName(4750, 'uk')).toBe('4750 mm'); // off the 100 mm step: never rounded to 4.8 m
  });

  it('names North American stock in whole feet', () => {
    // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959): 16 ft = 4876.8 mm, kept as 4877.
    // Dimension lumber 8–16 ft in 2 ft steps: common practice, no published source.
    expect([2438, 3658, 4877].map((mm) => stockLengthName(mm, 'na'))).toEqual(['8 ft', '12 ft', '16 ft']);
    // 92-5/8 in precut stud (common practice): 2352.675 mm, kept as 2353, is not a whole foot.
    expect(stockLengthName(2353, 'na')).toBe('7′-8 5/8″');
  });
});
