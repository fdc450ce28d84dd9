import { describe, expect, it } from 'vitest';
import { shortPieceMessage } from '@/lib/units';

// The minimum safe piece length is a yard setting (150 mm in the demo): a cross-cut saw cannot hold
// a shorter piece safely — common practice, no published source.
describe('shortPieceMessage', () => {
  it('passes pieces at or over the minimum', () => {
    expect(shortPieceMessage({ mm: 150, minSafeMm: 150, typed: '150' })).toBeNull();
    expect(shortPieceMessage({ mm: 2400, minSafeMm: 150, typed: '2400' })).toBeNull();
  });

  it('asks whether a bare decimal meant metres, and never guesses', () => {
    // 2.4 read as millimetres rounds to 2 mm; 2.4 m = 2400 mm.
    expect(shortPieceMessage({ mm: 2, minSafeMm: 150, typed: '2.4' })).toBe(
      '"2.4" has no unit, so it reads as 2 mm. Did you mean 2.4 m (2400 mm)? Write the unit to be sure.',
    );
    expect(shortPieceMessage({ mm: 0, minSafeMm: 150, typed: ' 0.6 ' })).toMatch(
      /Did you mean 0.6 m \(600 mm\)\?/,
    );
  });

  it('does not suggest metres for text with a unit, or when metres would be absurd too', () => {
    expect(shortPieceMessage({ mm: 100, minSafeMm: 150, typed: '100 mm' })).toMatch(
      /^100 mm is shorter than the yard's minimum safe piece length \(150 mm\)/,
    );
    expect(shortPieceMessage({ mm: 100, minSafeMm: 150, typed: '100' })).not.toMatch(/Did you mean/);
    expect(shortPieceMessage({ mm: 35, minSafeMm: 150 })).toMatch(/^35 mm is shorter/);
  });
});
