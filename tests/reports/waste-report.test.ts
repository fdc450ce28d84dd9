import { describe, expect, it } from 'vitest';
import { boardWasteMm, computeWasteReport, type DoneBoardRow } from '@/lib/reports/waste-report';
import { weekStartOf } from '@/lib/reports/week';

// Fixtures are small invented boards; every expected figure is worked by hand in the comments.
// Waste on a board = trim + kerfs + a remainder too short to keep (product definition, DESIGN.md);
// kerf 3 mm, trim 5 mm (common practice, no published source; TRADE.md).
const X = { sectionName: '47×100 C24', pencePerMetre: 300 };
const Y = { sectionName: '19×125 cladding', pencePerMetre: 500 };
const boards: DoneBoardRow[] = [
  // 4800 stock, trim 5 + trim kerf 3, pieces 2000 + 2000 with two kerfs, 786 kept: waste 5 + 3 + 6 = 14.
  {
    ...X,
    doneAt: new Date('2026-09-08T10:00:00Z'),
    lengthMm: 4800,
    pieceMm: 4000,
    remainderMm: 786,
    keepRemainder: true,
  },
  // 2400 stock, 1190 + 1190, 6 mm left and scrapped: waste 5 + 3 + 6 + 6 = 20.
  {
    ...X,
    doneAt: new Date('2026-09-09T10:00:00Z'),
    lengthMm: 2400,
    pieceMm: 2380,
    remainderMm: 6,
    keepRemainder: false,
  },
  // 1000 offcut (never trimmed), one 600 and one kerf, 397 kept: waste 3.
  {
    ...Y,
    doneAt: new Date('2026-09-15T10:00:00Z'),
    lengthMm: 1000,
    pieceMm: 600,
    remainderMm: 397,
    keepRemainder: true,
  },
  // Outside the range: ignored.
  {
    ...Y,
    doneAt: new Date('2026-08-01T10:00:00Z'),
    lengthMm: 3000,
    pieceMm: 1000,
    remainderMm: 10,
    keepRemainder: false,
  },
];
const start = new Date('2026-09-07T00:00:00Z');
const end = new Date('2026-09-21T00:00:00Z');

describe('waste report', () => {
  it('weeks start on Monday', () => {
    expect(weekStartOf(new Date('2026-09-13T23:59:00Z'))).toBe('2026-09-07');
    expect(weekStartOf(new Date('2026-09-14T00:00:00Z'))).toBe('2026-09-14');
  });

  it('counts waste per board as length − pieces − kept remainder', () => {
    expect(boards.slice(0, 3).map(boardWasteMm)).toEqual([14, 20, 3]);
  });

  it('gives weekly waste, yield and money from hand-worked boards', () => {
    const report = computeWasteReport({ boards, movements: [], start, end });
    // Week 1: material 7200, pieces 6380, kept 786, waste 34; yield 6380 / (7200 − 786) = 99.47 % → 99.5;
    // waste value 34 mm × 300 p/m = 10.2 p → 10.
    expect(report.weekly[0]).toEqual({
      week: '2026-09-07',
      boards: 2,
      materialMm: 7200,
      pieceMm: 6380,
      keptMm: 786,
      wasteMm: 34,
      wastePence: 10,
      yieldPercent: 99.5,
    });
    // Week 2: 600 / (1000 − 397) = 99.50 %; 3 mm × 500 p/m = 1.5 p → 2.
    expect(report.weekly[1]).toMatchObject({
      week: '2026-09-14',
      boards: 1,
      wasteMm: 3,
      wastePence: 2,
      yieldPercent: 99.5,
    });
    // Totals: waste 37, 6980 / (8200 − 1183) = 99.47 % → 99.5; money 10.2 + 1.5 = 11.7 p → 12.
    expect(report.totals).toMatchObject({
      boards: 3,
      materialMm: 8200,
      pieceMm: 6980,
      keptMm: 1183,
      wasteMm: 37,
      wastePence: 12,
      yieldPercent: 99.5,
    });
    expect(report.bySection.map((s) => [s.sectionName, s.wasteMm])).toEqual([
      ['47×100 C24', 34],
      ['19×125 cladding', 3],
    ]);
  });

  it('sets material cut against material bought, week by week', () => {
    const report = computeWasteReport({
      boards: [],
      start,
      end,
      movements: [
        {
          at: new Date('2026-09-07T08:00:00Z'),
          kind: 'receipt',
          quantityDelta: 20,
          lengthMm: 4800,
          valuePence: 22_000,
        },
        {
          at: new Date('2026-09-08T10:00:00Z'),
          kind: 'stock_cut',
          quantityDelta: -1,
          lengthMm: 4800,
          valuePence: 1100,
        },
        {
          at: new Date('2026-09-16T10:00:00Z'),
          kind: 'stock_cut',
          quantityDelta: -1,
          lengthMm: 2400,
          valuePence: 600,
        },
        // the second week's 3600 board was cut, then taken back at the saw: nothing used
        {
          at: new Date('2026-09-17T10:00:00Z'),
          kind: 'stock_cut',
          quantityDelta: -1,
          lengthMm: 3600,
          valuePence: 900,
        },
        {
          at: new Date('2026-09-17T10:05:00Z'),
          kind: 'board_undone',
          quantityDelta: 1,
          lengthMm: 3600,
          valuePence: -900,
        },
      ],
    });
    // 20 × 4800 = 96 000 mm bought in week 1; 4800 cut in week 1 and 2400 in week 2.
    expect(report.cutVersusBought).toEqual([
      { week: '2026-09-07', cutMm: 4800, cutPence: 1100, boughtMm: 96_000, boughtPence: 22_000 },
      { week: '2026-09-14', cutMm: 2400, cutPence: 600, boughtMm: 0, boughtPence: 0 },
    ]);
    expect(report.totals).toMatchObject({ cutMm: 7200, boughtMm: 96_000, yieldPercent: 0, boards: 0 });
  });

  it('an empty range gives zero weeks, not missing ones', () => {
    const report = computeWasteReport({ boards: [], movements: [], start, end });
    expect(report.weekly.map((w) => [w.week, w.boards])).toEqual([
      ['2026-09-07', 0],
      ['2026-09-14', 0],
    ]);
    expect(report.bySection).toEqual([]);
  });
});
