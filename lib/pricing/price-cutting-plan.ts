import { formatMillimetres } from '@/lib/units';
import type { CuttingPlanPrice, PriceCuttingPlanInput, PricedBoard, PriceLine } from './pricing-types';

/** One line per stock length and price, in the order the plan first uses them. */
function priceStockBoards(sectionName: string, boards: PricedBoard[]): PriceLine[] {
  const groups = new Map<string, { length: number; unitPence: number; count: number }>();
  for (const board of boards) {
    const unitPence = board.costPence;
    const key = `${board.length}:${unitPence}`;
    const group = groups.get(key) ?? { length: board.length, unitPence, count: 0 };
    group.count += 1;
    groups.set(key, group);
  }
  return [...groups.values()].map(({ length, unitPence, count }) => ({
    description: `${sectionName}, ${formatMillimetres(length)} mm stock length`,
    quantity: count,
    unit: 'board',
    unitPence,
    amountPence: count * unitPence,
  }));
}

/** One line per section for rack offcuts, charged on their total length, rounded once to the penny. */
function priceOffcuts(sectionName: string, boards: PricedBoard[], perMetrePence: number): PriceLine[] {
  if (boards.length === 0) return [];
  const totalMm = boards.reduce((sum, board) => sum + board.length, 0);
  const pieces = `${boards.length} ${boards.length === 1 ? 'piece' : 'pieces'}`;
  return [
    {
      description: `${sectionName}, offcuts from the rack (${pieces})${perMetrePence === 0 ? ', no charge' : ''}`,
      quantity: totalMm / 1000,
      unit: 'metre',
      unitPence: perMetrePence,
      amountPence: Math.round((totalMm * perMetrePence) / 1000),
    },
  ];
}

const whole = (n: number) => Number.isInteger(n) && n >= 0;

function checkBoard(board: PricedBoard): void {
  if (!whole(board.length) || !whole(board.cuts) || !whole(board.costPence)) {
    throw new RangeError('Board lengths, cut counts and costs must be whole numbers, not negative.');
  }
}

/**
 * Prices a cutting plan: new stock at the yard's price per board, rack offcuts at a price per metre
 * (free when none is set), and a charge for every saw cut. Prices are before any tax, in whole pence.
 */
export function priceCuttingPlan({
  sections,
  perCutPence,
  offcutPencePerMetre,
}: PriceCuttingPlanInput): CuttingPlanPrice {
  const perMetrePence = offcutPencePerMetre ?? 0;
  if (!whole(perCutPence) || !whole(perMetrePence)) {
    throw new RangeError('Charges must be whole pence, not negative.');
  }

  const lines: PriceLine[] = [];
  let cuts = 0;
  for (const { sectionName, boards } of sections) {
    boards.forEach(checkBoard);
    lines.push(
      ...priceStockBoards(
        sectionName,
        boards.filter((board) => board.source === 'stock'),
      ),
    );
    lines.push(
      ...priceOffcuts(
        sectionName,
        boards.filter((board) => board.source === 'offcut'),
        perMetrePence,
      ),
    );
    cuts += boards.reduce((sum, board) => sum + board.cuts, 0);
  }
  const materialsPence = lines.reduce((sum, line) => sum + line.amountPence, 0);
  const cuttingPence = cuts * perCutPence;
  if (cuts > 0)
    lines.push({
      description: 'Cutting to length',
      quantity: cuts,
      unit: 'cut',
      unitPence: perCutPence,
      amountPence: cuttingPence,
    });

  return { lines, materialsPence, cuttingPence, totalPence: materialsPence + cuttingPence };
}
