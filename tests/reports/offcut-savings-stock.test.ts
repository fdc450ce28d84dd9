import { describe, expect, it } from 'vitest';
import { computeOffcutReport, type RackOffcutRow } from '@/lib/reports/offcut-report';
import { computeSavingsReport, type PlannedJobRow } from '@/lib/reports/savings-report';
import { computeStockReport } from '@/lib/reports/stock-report';

// Invented fixtures; every expected figure is worked by hand beside it.
const start = new Date('2026-09-07T00:00:00Z');
const end = new Date('2026-09-21T00:00:00Z');

describe('offcut report', () => {
  const now = new Date('2026-09-20T12:00:00Z');
  const rack: RackOffcutRow[] = [
    {
      id: 1,
      tag: 'K-1',
      sectionName: 'X',
      lengthMm: 1000,
      location: 'A1',
      createdAt: new Date('2026-09-10T12:00:00Z'),
      pencePerMetre: 300,
    },
    {
      id: 2,
      tag: 'K-2',
      sectionName: 'X',
      lengthMm: 500,
      location: 'Short bin',
      createdAt: new Date('2026-05-01T12:00:00Z'),
      pencePerMetre: 300,
    },
    {
      id: 3,
      tag: 'K-3',
      sectionName: 'Y',
      lengthMm: 2000,
      location: 'B2',
      createdAt: new Date('2026-01-01T12:00:00Z'),
      pencePerMetre: 500,
    },
  ];
  const report = computeOffcutReport({
    rack,
    now,
    start,
    end,
    clearAfterDays: 90,
    movements: [
      { at: new Date('2026-09-08T10:00:00Z'), kind: 'offcut_made', lengthMm: 786 },
      { at: new Date('2026-09-09T10:00:00Z'), kind: 'offcut_made', lengthMm: 1389 },
      { at: new Date('2026-09-15T10:00:00Z'), kind: 'offcut_used', lengthMm: 1000 },
      { at: new Date('2026-09-16T10:00:00Z'), kind: 'offcut_scrapped', lengthMm: 320 },
    ],
  });

  it('counts offcuts made and used each week', () => {
    expect(report.weekly).toEqual([
      { week: '2026-09-07', madeCount: 2, madeMm: 2175, usedCount: 0, usedMm: 0, scrappedCount: 0 },
      { week: '2026-09-14', madeCount: 0, madeMm: 0, usedCount: 1, usedMm: 1000, scrappedCount: 1 },
    ]);
  });

  it('values the rack by section at its price per metre', () => {
    // Y: 2.0 m × 500 p = 1000 p. X: 1.5 m × 300 p = 450 p.
    expect(report.rackBySection).toEqual([
      { sectionName: 'Y', count: 1, lengthMm: 2000, valuePence: 1000 },
      { sectionName: 'X', count: 2, lengthMm: 1500, valuePence: 450 },
    ]);
    expect(report.totals).toMatchObject({
      made: 2,
      used: 1,
      scrapped: 1,
      rackCount: 3,
      rackMm: 3500,
      rackValuePence: 1450,
    });
  });

  it('buckets ages and lists the oldest first, flagging those past the clearing age', () => {
    // Ages on 20 Sep: 10, 142 and 262 days.
    expect(report.ageHistogram.map((b) => b.count)).toEqual([1, 0, 0, 1, 1]);
    expect(report.oldest.map((o) => [o.tag, o.ageDays, o.clearSuggested])).toEqual([
      ['K-3', 262, true],
      ['K-2', 142, true],
      ['K-1', 10, false],
    ]);
  });
});

describe('savings report', () => {
  const row = (
    planId: number,
    day: string,
    stockBoards: number,
    stockCostPence: number,
    baselineBoards: number,
    baselineCostPence: number,
  ): PlannedJobRow => ({
    planId,
    jobReference: `J-${planId}`,
    customerName: 'C',
    plannedAt: new Date(`${day}T09:00:00Z`),
    stockBoards,
    stockCostPence,
    baselineBoards,
    baselineCostPence,
  });

  it('sets each plan against its longest-first plan, with a running total', () => {
    const report = computeSavingsReport({
      start,
      end,
      plans: [
        row(4, '2026-09-18', 7, 4000, 8, 4500),
        row(1, '2026-09-08', 10, 5000, 12, 6200),
        row(2, '2026-09-10', 5, 3000, 5, 3000),
        row(3, '2026-10-01', 1, 1, 9, 9999),
      ],
    });
    // Saved: 12 − 10 = 2 boards and 1200 p; then 0; then 1 board and 500 p. Running 1200, 1200, 1700.
    expect(report.jobs.map((j) => [j.planId, j.savedBoards, j.savedPence, j.runningSavedPence])).toEqual([
      [1, 2, 1200, 1200],
      [2, 0, 0, 1200],
      [4, 1, 500, 1700],
    ]);
    expect(report.totals).toEqual({
      jobs: 3,
      stockBoards: 22,
      baselineBoards: 25,
      savedBoards: 3,
      stockCostPence: 12_000,
      baselineCostPence: 13_700,
      savedPence: 1700,
    });
  });
});

describe('stock report', () => {
  it('works out weeks of cover and flags lengths that run short', () => {
    const cuts = (id: number, n: number) =>
      Array.from({ length: n }, (_, i) => ({
        at: new Date(start.getTime() + i * 3_600_000),
        stockLengthId: id,
        boards: 1,
      }));
    const report = computeStockReport({
      start,
      end, // two weeks
      lengths: [
        { stockLengthId: 1, sectionName: 'X', lengthMm: 4800, onHand: 5, active: true },
        { stockLengthId: 2, sectionName: 'X', lengthMm: 3600, onHand: 30, active: true },
        { stockLengthId: 3, sectionName: 'Y', lengthMm: 2400, onHand: null, active: true },
        { stockLengthId: 4, sectionName: 'Y', lengthMm: 3000, onHand: 0, active: true },
        { stockLengthId: 5, sectionName: 'Y', lengthMm: 6000, onHand: 0, active: false },
      ],
      cuts: [...cuts(1, 8), ...cuts(2, 8), ...cuts(3, 4)],
    });
    // 8 boards in 2 weeks = 4 a week: 5 on hand last 1.25 weeks (short, under 3); 30 last 7.5 weeks.
    expect(report.lines.map((l) => [l.stockLengthId, l.usedPerWeek, l.weeksOfCover, l.short])).toEqual([
      [2, 4, 7.5, false],
      [1, 4, 1.3, true],
      [3, 2, null, false],
      [4, 0, null, true],
    ]);
    expect(report.short.map((l) => l.stockLengthId)).toEqual([1, 4]);
  });
});
