// A quote's lines and totals: retail VAT-inclusive with the VAT content, trade net, VAT, total.
import { formatPence } from '@/lib/format/money';
import type { QuoteView } from '@/lib/quotes/get-plan-quote';

const quantity = (q: number, unit: string) =>
  unit === 'metre'
    ? `${q.toLocaleString('en-GB')} m`
    : unit === 'percent'
      ? ''
      : `${q} ${unit}${q === 1 ? '' : 's'}`;

export function QuoteTable({ quote }: { quote: QuoteView }) {
  const retail = quote.account === 'retail';
  const totals: [string, number, boolean][] = retail
    ? [
        ['Total to pay', quote.grossPence, true],
        [`Includes VAT at ${quote.vatRatePercent} %`, quote.vatPence, false],
      ]
    : [
        ['Total before VAT', quote.netPence, false],
        [`VAT at ${quote.vatRatePercent} %`, quote.vatPence, false],
        ['Total to pay', quote.grossPence, true],
      ];
  return (
    <table className="w-full text-left text-sm" data-testid="quote-table">
      <caption className="sr-only">Quote {quote.number}</caption>
      <thead className="text-bark-soft">
        <tr>
          <th className="py-1 font-semibold">Item</th>
          <th className="py-1 text-right font-semibold">Quantity</th>
          <th className="py-1 text-right font-semibold">{retail ? 'Price inc. VAT' : 'Price ex VAT'}</th>
        </tr>
      </thead>
      <tbody>
        {quote.lines.map((line, i) => (
          <tr key={i} className="border-t border-sand">
            <td className="py-1.5 pr-2">{line.description}</td>
            <td className="py-1.5 text-right whitespace-nowrap">{quantity(line.quantity, line.unit)}</td>
            <td className="py-1.5 text-right font-mono whitespace-nowrap">
              {formatPence(retail ? (line.grossAmountPence ?? line.amountPence) : line.amountPence)}
            </td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        {totals.map(([label, pence, bold]) => (
          <tr key={label} className={bold ? 'border-t-2 border-bark font-bold' : 'border-t border-sand'}>
            <th colSpan={2} scope="row" className="py-1.5 text-right font-semibold">
              {label}
            </th>
            <td
              className="py-1.5 text-right font-mono whitespace-nowrap"
              data-testid={bold ? 'quote-total' : undefined}
            >
              {formatPence(pence)}
            </td>
          </tr>
        ))}
      </tfoot>
    </table>
  );
}
