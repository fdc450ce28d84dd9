// Prices a plan as a quote, all in whole pence: new stock at the yard's board prices (less a trade
// discount), rack offcuts at the offcut rate, cutting, delivery, a minimum-charge top-up, then VAT.
// Pure: the caller reads the plan's boards and the yard's prices.
import type { AccountKind } from '@/db/enums';
import { formatMillimetres } from '@/lib/units';
import type { QuoteFigures, QuoteLine } from './quote-shapes';
import { grossOf, vatInGross, vatOnNet } from './vat';

export type QuoteBoard = {
  sectionId: number;
  sectionName: string;
  source: 'stock' | 'offcut';
  lengthMm: number;
  /** The stock length's price; ignored for offcuts. */
  pricePence: number;
  cuts: number;
};

/** The section's cheapest stock length per metre: the base of the offcut rate. */
export type SectionRate = { pricePence: number; lengthMm: number };

export type PriceQuoteInput = {
  boards: QuoteBoard[];
  sectionRates: Map<number, SectionRate>;
  perCutPence: number;
  offcutRatePercent: number;
  deliveryPence: number;
  minimumChargePence: number;
  account: AccountKind;
  discountPercent: number;
  vatRateBasisPoints: number;
  depositPercent: number;
};

const roundDiv = (numerator: number, denominator: number) =>
  Math.floor((2 * numerator + denominator) / (2 * denominator));
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

function timberLines(input: PriceQuoteInput): QuoteLine[] {
  const lines: QuoteLine[] = [];
  const sectionIds = [...new Set(input.boards.map((b) => b.sectionId))];
  for (const sectionId of sectionIds) {
    const boards = input.boards.filter((b) => b.sectionId === sectionId);
    const name = boards[0].sectionName;
    const groups = new Map<string, { lengthMm: number; pricePence: number; count: number }>();
    for (const board of boards.filter((b) => b.source === 'stock')) {
      const key = `${board.lengthMm}:${board.pricePence}`;
      const group = groups.get(key) ?? { lengthMm: board.lengthMm, pricePence: board.pricePence, count: 0 };
      group.count += 1;
      groups.set(key, group);
    }
    for (const g of groups.values()) {
      lines.push({
        description: `${name}, ${formatMillimetres(g.lengthMm)} mm stock length`,
        quantity: g.count,
        unit: 'board',
        unitPence: g.pricePence,
        amountPence: g.count * g.pricePence,
      });
    }
    const offcuts = boards.filter((b) => b.source === 'offcut');
    const rate = input.sectionRates.get(sectionId);
    if (offcuts.length && rate) {
      const totalMm = offcuts.reduce((sum, b) => sum + b.lengthMm, 0);
      // share × (price / length) per millimetre, rounded once on the whole length.
      const scale = rate.lengthMm * 100;
      lines.push({
        description: `${name}, ${plural(offcuts.length, 'offcut')} from the rack at ${input.offcutRatePercent} % of the price per metre`,
        quantity: totalMm / 1000,
        unit: 'metre',
        unitPence: roundDiv(1000 * rate.pricePence * input.offcutRatePercent, scale),
        amountPence: roundDiv(totalMm * rate.pricePence * input.offcutRatePercent, scale),
      });
    }
  }
  return lines;
}

export function priceQuote(input: PriceQuoteInput): QuoteFigures {
  const lines = timberLines(input);
  const timberPence = lines.reduce((sum, l) => sum + l.amountPence, 0);
  if (input.account === 'trade' && input.discountPercent > 0 && timberPence > 0) {
    const discount = roundDiv(timberPence * input.discountPercent, 100);
    lines.push({
      description: `Trade discount on timber, ${input.discountPercent} %`,
      quantity: input.discountPercent,
      unit: 'percent',
      unitPence: 0,
      amountPence: -discount,
    });
  }
  const cuts = input.boards.reduce((sum, b) => sum + b.cuts, 0);
  if (cuts > 0) {
    lines.push({
      description: 'Cutting to length',
      quantity: cuts,
      unit: 'cut',
      unitPence: input.perCutPence,
      amountPence: cuts * input.perCutPence,
    });
  }
  if (input.deliveryPence > 0) {
    lines.push({
      description: 'Delivery',
      quantity: 1,
      unit: 'job',
      unitPence: input.deliveryPence,
      amountPence: input.deliveryPence,
    });
  }
  const subtotal = lines.reduce((sum, l) => sum + l.amountPence, 0);
  if (subtotal < input.minimumChargePence) {
    const topUp = input.minimumChargePence - subtotal;
    lines.push({
      description: 'Minimum order charge (top-up)',
      quantity: 1,
      unit: 'job',
      unitPence: topUp,
      amountPence: topUp,
    });
  }
  const rate = input.vatRateBasisPoints;
  let netPence: number;
  let vatPence: number;
  let grossPence: number;
  if (input.account === 'retail') {
    for (const line of lines) line.grossAmountPence = grossOf(line.amountPence, rate);
    grossPence = lines.reduce((sum, l) => sum + (l.grossAmountPence ?? 0), 0);
    vatPence = vatInGross(grossPence, rate);
    netPence = grossPence - vatPence;
  } else {
    netPence = lines.reduce((sum, l) => sum + l.amountPence, 0);
    vatPence = vatOnNet(netPence, rate);
    grossPence = netPence + vatPence;
  }
  return {
    account: input.account,
    lines,
    netPence,
    vatPence,
    grossPence,
    vatRateBasisPoints: rate,
    depositPence: roundDiv(grossPence * input.depositPercent, 100),
  };
}
