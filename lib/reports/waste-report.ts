// Waste and yield from the boards the saw finished, and material cut against material bought.
// Pure: the rows come from get-waste-report.ts; tests feed hand-worked fixtures.
import { weekStartOf, weekStartsBetween } from './week';

/** One finished board. pieceMm is the sum of its pieces' lengths. */
export type DoneBoardRow = {
  doneAt: Date;
  sectionName: string;
  lengthMm: number;
  pieceMm: number;
  remainderMm: number;
  keepRemainder: boolean;
  /** What a metre of this section costs the yard (cheapest stock length), to price the waste. */
  pencePerMetre: number;
};

/**
 * Receipts (stock bought), stock cuts (stock boards taken to the saw, quantity −1) and stock boards
 * taken back at the saw ('board_undone', quantity +1, value negative), which cancel a cut.
 */
export type MaterialMovementRow = {
  at: Date;
  kind: 'receipt' | 'stock_cut' | 'board_undone';
  quantityDelta: number;
  lengthMm: number;
  valuePence: number;
};

export type WasteFigures = {
  boards: number;
  materialMm: number;
  pieceMm: number;
  keptMm: number;
  wasteMm: number;
  wastePence: number;
  yieldPercent: number;
};

export type CutVersusBought = {
  week: string;
  cutMm: number;
  cutPence: number;
  boughtMm: number;
  boughtPence: number;
};

export type WasteReport = {
  weekly: (WasteFigures & { week: string })[];
  bySection: (WasteFigures & { sectionName: string })[];
  cutVersusBought: CutVersusBought[];
  totals: WasteFigures & { cutMm: number; boughtMm: number; cutPence: number; boughtPence: number };
};

/** Waste on a board = trim + kerfs + a remainder too short to keep = length − pieces − kept remainder. */
export function boardWasteMm(
  b: Pick<DoneBoardRow, 'lengthMm' | 'pieceMm' | 'remainderMm' | 'keepRemainder'>,
): number {
  return b.lengthMm - b.pieceMm - (b.keepRemainder ? b.remainderMm : 0);
}

/** Yield = pieces ÷ (material − kept remainders), the same definition the solver uses. */
export function yieldPercent(pieceMm: number, materialMm: number, keptMm: number): number {
  const used = materialMm - keptMm;
  return used > 0 ? Math.round((1000 * pieceMm) / used) / 10 : 0;
}

type Sum = {
  boards: number;
  materialMm: number;
  pieceMm: number;
  keptMm: number;
  wasteMm: number;
  wastePenceExact: number;
};
const emptySum = (): Sum => ({
  boards: 0,
  materialMm: 0,
  pieceMm: 0,
  keptMm: 0,
  wasteMm: 0,
  wastePenceExact: 0,
});

function add(sum: Sum, b: DoneBoardRow): void {
  const waste = boardWasteMm(b);
  sum.boards++;
  sum.materialMm += b.lengthMm;
  sum.pieceMm += b.pieceMm;
  sum.keptMm += b.keepRemainder ? b.remainderMm : 0;
  sum.wasteMm += waste;
  sum.wastePenceExact += (waste * b.pencePerMetre) / 1000;
}

function figures(sum: Sum): WasteFigures {
  const { wastePenceExact, ...rest } = sum;
  return {
    ...rest,
    wastePence: Math.round(wastePenceExact),
    yieldPercent: yieldPercent(sum.pieceMm, sum.materialMm, sum.keptMm),
  };
}

export function computeWasteReport({
  boards,
  movements,
  start,
  end,
}: {
  boards: DoneBoardRow[];
  movements: MaterialMovementRow[];
  start: Date;
  /** Exclusive. */
  end: Date;
}): WasteReport {
  const inRange = (at: Date) => at >= start && at < end;
  const weeks = weekStartsBetween(start, new Date(end.getTime() - 1));
  const byWeek = new Map(weeks.map((w) => [w, emptySum()]));
  const bySection = new Map<string, Sum>();
  const total = emptySum();
  for (const b of boards) {
    if (!inRange(b.doneAt)) continue;
    add(byWeek.get(weekStartOf(b.doneAt))!, b);
    if (!bySection.has(b.sectionName)) bySection.set(b.sectionName, emptySum());
    add(bySection.get(b.sectionName)!, b);
    add(total, b);
  }

  const flows = new Map(
    weeks.map((week) => [week, { week, cutMm: 0, cutPence: 0, boughtMm: 0, boughtPence: 0 }]),
  );
  for (const m of movements) {
    if (!inRange(m.at)) continue;
    const flow = flows.get(weekStartOf(m.at))!;
    if (m.kind === 'receipt') {
      flow.boughtMm += m.quantityDelta * m.lengthMm;
      flow.boughtPence += m.valuePence;
    } else {
      flow.cutMm -= m.quantityDelta * m.lengthMm;
      flow.cutPence += m.valuePence;
    }
  }
  const cutVersusBought = [...flows.values()];
  const sumOf = (key: keyof Omit<CutVersusBought, 'week'>) => cutVersusBought.reduce((s, f) => s + f[key], 0);

  return {
    weekly: weeks.map((week) => ({ week, ...figures(byWeek.get(week)!) })),
    bySection: [...bySection.entries()]
      .map(([sectionName, sum]) => ({ sectionName, ...figures(sum) }))
      .sort((a, b) => b.wasteMm - a.wasteMm),
    cutVersusBought,
    totals: {
      ...figures(total),
      cutMm: sumOf('cutMm'),
      boughtMm: sumOf('boughtMm'),
      cutPence: sumOf('cutPence'),
      boughtPence: sumOf('boughtPence'),
    },
  };
}
