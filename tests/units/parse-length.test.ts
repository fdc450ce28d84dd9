import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/units';

function mmOf(text: string): number {
  const result = parseLength(text);
  if (!result.ok) throw new Error(`expected "${text}" to parse: ${result.message}`);
  return result.mm;
}

describe('parseLength: metric', () => {
  it('reads bare numbers and mm as millimetres', () => {
    expect(mmOf('2400')).toBe(2400);
    expect(mmOf('2400mm')).toBe(2400);
    expect(mmOf(' 2400 MM ')).toBe(2400);
    expect(mmOf('2400.4')).toBe(2400);
    expect(mmOf('2400.5')).toBe(2401);
  });

  it('reads space-grouped thousands as printed (Metric Handbook, ch. 1: 15 000)', () => {
    expect(mmOf('15 000')).toBe(15000);
    expect(mmOf('15\u00a0000 mm')).toBe(15000);
  });

  it('reads metres exactly', () => {
    expect(mmOf('2.4m')).toBe(2400);
    expect(mmOf('2.4 m')).toBe(2400);
    expect(mmOf('4.8 metres')).toBe(4800);
    expect(mmOf('0.3m')).toBe(300);
  });

  it('refuses commas, centimetres and negatives with a message', () => {
    for (const text of [
      '2,400',
      '2,4 m',
      '240cm',
      '240 cm',
      '-300',
      '',
      '   ',
      'abc',
      '12 34',
      '2400 ft x',
    ]) {
      const result = parseLength(text);
      expect(result.ok, text).toBe(false);
      if (!result.ok) expect(result.message.length).toBeGreaterThan(5);
    }
  });
});

describe('parseLength: feet and inches', () => {
  it('1 in = 25.4 mm exactly (international yard and pound agreement, 1959)', () => {
    expect(mmOf('1"')).toBe(25);
    expect(mmOf('10"')).toBe(254);
    expect(mmOf('100 in')).toBe(2540);
    expect(mmOf("10'")).toBe(3048); // 120 in × 25.4 = 3048 mm exactly
  });

  it('reads a 92 5/8 in precut stud as 2353 mm in every notation (common practice, no published source)', () => {
    // 92.625 in × 25.4 = 2352.675 mm → 2353 mm
    for (const text of [
      '92 5/8"',
      '92-5/8"',
      '92 5/8',
      '92-5/8 in',
      '7\' 8 5/8"',
      '7\'-8 5/8"',
      '7′-8 5/8″',
      '7 ft 8 5/8 in',
      '92.625"',
    ]) {
      expect(mmOf(text), text).toBe(2353);
    }
  });

  it('8 ft 1-1/8 in = 97.125 in (TRADE.md, common practice, no published source)', () => {
    // 97.125 in × 25.4 = 2466.975 mm → 2467 mm; the same as 92 5/8 + 3 × 1 1/2 in
    expect(mmOf('8\' 1-1/8"')).toBe(2467);
    expect(mmOf('97 1/8"')).toBe(2467);
    expect(mmOf('8ft 1 1/8in')).toBe(2467);
  });

  it('reads feet alone, zero inches and fractions alone', () => {
    expect(mmOf('8ft')).toBe(2438); // 96 in × 25.4 = 2438.4
    expect(mmOf("8'")).toBe(2438);
    expect(mmOf('4\'-0"')).toBe(1219); // 48 in = 1219.2 mm
    expect(mmOf('3/4"')).toBe(19); // 19.05 mm
    expect(mmOf('7\'8"')).toBe(2337); // 92 in = 2336.8 mm
    expect(mmOf('7’-8 5/8”')).toBe(2353); // smart quotes pasted from a word processor
    expect(mmOf("7' 8 5/8''")).toBe(2353); // two apostrophes for inches
  });

  it('converts exactly before one final rounding, halves rounded up', () => {
    // 5/8 in = 15.875 mm → 16
    expect(mmOf('5/8"')).toBe(16);
    // 2 1/2 in = 63.5 mm exactly, a true half: floating point must not tip it either way
    expect(mmOf('2 1/2"')).toBe(64);
    // 80 in × 25.4 = 2032 mm, no rounding at all
    expect(mmOf('80"')).toBe(2032);
  });

  it('refuses bad fractions', () => {
    expect(parseLength('3/0"').ok).toBe(false);
    expect(parseLength('1 3/2"').ok).toBe(false);
    expect(parseLength('"').ok).toBe(false);
    expect(parseLength("'").ok).toBe(false);
  });

  it('refuses non-text input without throwing', () => {
    expect(parseLength(2400).ok).toBe(false);
    expect(parseLength(null).ok).toBe(false);
  });
});
