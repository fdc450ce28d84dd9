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
  it('says how many boards better is possible, or that none is', () => {
    expect(describeGap({ boards: 10, lowerBoundBoards: 9, gapBoards: 1 })).toMatch(
      /^At most 1 board better is possible/,
    );
    expect(describeGap({ boards: 10, lowerBoundBoards: 10, gapBoards: 0 })).toMatch(
      /No plan can use fewer than 10 boards/,
    );
  });
});
