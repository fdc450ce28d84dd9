// Stock on hand against how fast the saw uses it, and the lengths that will run short.
export type StockLengthRow = {
  stockLengthId: number;
  sectionName: string;
  lengthMm: number;
  onHand: number | null;
  active: boolean;
};
/** A board cut from a stock length (boards 1), or a cut board taken back at the saw (boards −1). */
export type StockCutRow = { at: Date; stockLengthId: number; boards: number };

export type StockLine = StockLengthRow & {
  used: number;
  usedPerWeek: number;
  /** Weeks the count on hand lasts at the range's rate of use; null when unlimited or unused. */
  weeksOfCover: number | null;
  short: boolean;
};

export type StockReport = { lines: StockLine[]; short: StockLine[]; weeks: number };

/** A counted length with less than this many weeks of cover is flagged (yard rule of thumb, our default). */
export const SHORT_COVER_WEEKS = 3;

export function computeStockReport({
  lengths,
  cuts,
  start,
  end,
}: {
  lengths: StockLengthRow[];
  cuts: StockCutRow[];
  start: Date;
  end: Date;
}): StockReport {
  const weeks = Math.max(1, (end.getTime() - start.getTime()) / (7 * 86_400_000));
  const used = new Map<number, number>();
  for (const c of cuts) {
    if (c.at >= start && c.at < end) used.set(c.stockLengthId, (used.get(c.stockLengthId) ?? 0) + c.boards);
  }
  const lines = lengths
    .filter((l) => l.active)
    .map((l) => {
      const n = Math.max(0, used.get(l.stockLengthId) ?? 0);
      const usedPerWeek = Math.round((n / weeks) * 10) / 10;
      const weeksOfCover =
        l.onHand === null || n === 0 ? null : Math.round((l.onHand / (n / weeks)) * 10) / 10;
      const short =
        l.onHand !== null && (l.onHand === 0 || (weeksOfCover !== null && weeksOfCover < SHORT_COVER_WEEKS));
      return { ...l, used: n, usedPerWeek, weeksOfCover, short };
    })
    .sort((a, b) => a.sectionName.localeCompare(b.sectionName) || a.lengthMm - b.lengthMm);
  return { lines, short: lines.filter((l) => l.short), weeks: Math.round(weeks * 10) / 10 };
}
