// The quote on the PDF cut sheet: retail VAT-inclusive with the VAT content, trade net + VAT.
import { StyleSheet, Text, View } from '@react-pdf/renderer';
import { formatPence } from '@/lib/format/money';
import type { QuoteView } from '@/lib/quotes/get-plan-quote';

const s = StyleSheet.create({
  h2: { fontSize: 13, fontFamily: 'Helvetica-Bold', marginTop: 14, marginBottom: 6 },
  row: { flexDirection: 'row', borderBottom: '0.5pt solid #d9c6a5', paddingVertical: 2 },
  cell: { flex: 3 },
  num: { flex: 1, textAlign: 'right' },
  bold: { fontFamily: 'Helvetica-Bold' },
  muted: { color: '#5b4a3a' },
});
const money = (pence: number) => formatPence(pence).replace('−', '-');

function Row({ label, value, bold }: { label: string; value: string; bold?: boolean }) {
  return (
    <View style={s.row}>
      <Text style={bold ? [s.cell, s.bold] : s.cell}>{label}</Text>
      <Text style={bold ? [s.num, s.bold] : s.num}>{value}</Text>
    </View>
  );
}

export function PdfQuote({ quote }: { quote: QuoteView }) {
  const retail = quote.account === 'retail';
  return (
    <View wrap={false}>
      <Text style={s.h2}>Quote {quote.number}</Text>
      <Text style={s.muted}>
        Valid until {quote.validUntil.slice(0, 10)} · {retail ? 'prices include VAT' : 'prices exclude VAT'}{' '}
        at {quote.vatRatePercent} %
      </Text>
      {quote.lines.map((line, i) => (
        <Row
          key={i}
          label={`${line.description} (${line.quantity} ${line.unit})`}
          value={money(retail ? (line.grossAmountPence ?? line.amountPence) : line.amountPence)}
        />
      ))}
      {retail ? (
        <>
          <Row label="Total to pay" value={money(quote.grossPence)} bold />
          <Row label={`Includes VAT at ${quote.vatRatePercent} %`} value={money(quote.vatPence)} />
        </>
      ) : (
        <>
          <Row label="Total before VAT" value={money(quote.netPence)} />
          <Row label={`VAT at ${quote.vatRatePercent} %`} value={money(quote.vatPence)} />
          <Row label="Total to pay" value={money(quote.grossPence)} bold />
        </>
      )}
    </View>
  );
}
