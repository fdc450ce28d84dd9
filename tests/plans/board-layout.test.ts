import { describe, expect, it } from 'vitest';
import { describeGap } from '@/components/plans/gap-words';
import { layOutBoard } from '@/lib/plans/board-layout';

describe('layOutBoard', () => {
  it('places trim, kerfs, pieces and the end so they add up to the board', () => {
    // 2400 board, 5 trim + 3 kerf, two 1000 pieces each followed by a 3 mm kerf: 2400 − 8 − 2006 = 386 left.
    // Kerf arithmetic: n pieces cut from one end take n kerfs (common practice; see TRADE.md).
    const parts = layOutBoard({
      lengthMm: 2400,
      trimMm: 5,
      kerfMm: 3,
      pieces: [
        { lengthMm: 1000, label: 'a' },
        { lengthMm: 1000, label: 'b' },
      ],
      remainderMm: 386,
      keepRemainder: true,
    });
    expect(parts.map((p) => [p.kind, p.startMm, p.lengthMm])).toEqual([
      ['trim', 0, 5],
      ['kerf', 5, 3],
      ['piece', 8, 1000],
      ['kerf', 1008, 3],
      ['piece', 1011, 1000],
      ['kerf', 2011, 3],
      ['kept', 2014, 386],
    ]);
    expect(parts.reduce((sum, p) => sum + p.lengthMm, 0)).toBe(2400);
  });

  it('takes no kerf after a piece that ends at the board end (n − 1 kerfs)', () => {
    const parts = layOutBoard({
      lengthMm: 2003,
      trimMm: 0,
      kerfMm: 3,
      pieces: [
        { lengthMm: 1000, label: '' },
        { lengthMm: 1000, label: '' },
      ],
      remainderMm: 0,
      keepRemainder: false,
    });
    expect(parts.map((p) => p.kind)).toEqual(['piece', 'kerf', 'piece']);
  });
});

describe('describeGap', () => {
  const figures = { lowerBoundBoards: 51, gapBoards: 10 };
  it('says the gap in money against the new stock, not in boards', () => {
    const words = describeGap({ ...figures, stockCostPence: 51_642, lowerBoundPence: 51_630 });
    expect(words).toMatch(/^At most £0\.12 cheaper is possible/);
    expect(words).toContain('less than £516.30 (this plan: £516.42)');
    expect(words).not.toMatch(/boards? better/);
  });
  it('says "cheapest possible" when the plan meets its bound', () => {
    expect(describeGap({ ...figures, stockCostPence: 9_600, lowerBoundPence: 9_600 })).toMatch(
      /^Cheapest possible/,
    );
  });
  it('falls back to boards for plans made before the bound was kept in pence', () => {
    expect(describeGap({ ...figures, stockCostPence: 9_600 })).toBe(
      'No plan for these pieces can use fewer than 51 boards.',
    );
  });
});
