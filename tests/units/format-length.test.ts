import { describe, expect, it } from 'vitest';
import { formatLength } from '@/lib/units';

describe('formatLength: metric (Metric Handbook, ch. 1: no separator under five digits, 1500 and 15 000)', () => {
  it('prints plain millimetres', () => {
    expect(formatLength(1500, 'mm')).toBe('1500');
    expect(formatLength(15000, 'mm')).toBe('15 000');
    expect(formatLength(9999, 'mm')).toBe('9999');
    expect(formatLength(125000, 'mm')).toBe('125 000');
    expect(formatLength(1234567, 'mm')).toBe('1 234 567');
    expect(formatLength(0, 'mm')).toBe('0');
  });
});

describe('formatLength: imperial (open textbook "Fundamentals – Drawings and Specifications")', () => {
  it('prints feet-dash-inches with reduced fractions', () => {
    expect(formatLength(2353, 'imperial')).toBe('7′-8 5/8″'); // 2353 / 25.4 = 92.638 in → 92 10/16 = 7 ft 8 5/8 in
    expect(formatLength(1219, 'imperial')).toBe('4′-0″'); // 1219 / 25.4 = 47.992 in → 48 in
    expect(formatLength(2438, 'imperial')).toBe('8′-0″'); // 8 ft (2438.4 mm)
    expect(formatLength(2467, 'imperial')).toBe('8′-1 1/8″'); // 97.126 in (TRADE.md, common practice)
  });

  it('prints inches alone under a foot', () => {
    expect(formatLength(292, 'imperial')).toBe('11 1/2″'); // 11.496 in
    expect(formatLength(19, 'imperial')).toBe('3/4″'); // 0.748 in
    expect(formatLength(25, 'imperial')).toBe('1″'); // 0.984 in → 16/16
    expect(formatLength(0, 'imperial')).toBe('0″');
  });

  it('reduces fractions to the smallest denominator', () => {
    expect(formatLength(254, 'imperial')).toBe('10″'); // exactly 10 in
    expect(formatLength(267, 'imperial')).toBe('10 1/2″'); // 10.512 in → 10 8/16
    expect(formatLength(1, 'imperial')).toBe('1/16″'); // 0.039 in → 1/16 (nearest)
  });
});
