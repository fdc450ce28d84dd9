import type { DisplayUnit, Region } from '@/db/enums';
import { formatLength } from '@/lib/units';
import { stockLengthName } from '@/lib/units/stock-length-name';
import type { SectionRow, StockLengthRow } from '@/lib/queries/stock';

/** A length with its unit, so a bare number is never mistaken: "4800 mm" or 15′-9″. */
export const lengthText = (mm: number, unit: DisplayUnit) =>
  unit === 'mm' ? `${formatLength(mm, unit)} mm` : formatLength(mm, unit);

/** Margin on the selling price, e.g. "38 % margin" (price 960 p, cost 600 p). */
export const marginText = (l: Pick<StockLengthRow, 'pricePence' | 'costPence'>) =>
  l.costPence === null || l.pricePence === 0
    ? ''
    : `${Math.round((100 * (l.pricePence - l.costPence)) / l.pricePence)} % margin`;

export const onHandText = (l: Pick<StockLengthRow, 'onHand'>) =>
  l.onHand === null ? 'unlimited' : `${l.onHand} on hand`;

/** Every active stock length as a choice: "47×100 C24 treated — 4.8 m (23 on hand)". */
export function stockLengthChoices(sections: SectionRow[], region: Region) {
  return sections
    .filter((s) => s.active)
    .flatMap((s) =>
      s.lengths
        .filter((l) => l.active)
        .map((l) => ({
          id: l.id,
          label: `${s.name} — ${stockLengthName(l.lengthMm, region)} (${onHandText(l)})`,
        })),
    );
}
