// The PDF cut sheet: job, pieces by section, board diagrams and the price.
import { formatCustomerDate } from '@/lib/format/customer-date';
import { Document, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import { angleLine } from '@/lib/plans/angle-line';
import { groupIdenticalBoards } from '@/lib/plans/group-boards';
import type { PlanViewData } from '@/lib/queries/plans';
import type { QuoteView } from '@/lib/quotes/get-plan-quote';
import { PdfBoard } from './pdf-board';
import { actualCutMm, cutLengthText, cutRange, FULL_LENGTH_WORDS } from '@/lib/plans/cut-words';
import { PdfQuote } from './pdf-quote';

const s = StyleSheet.create({
  page: { padding: 36, fontSize: 10, fontFamily: 'Helvetica', color: '#231a12' },
  h1: { fontSize: 18, fontFamily: 'Helvetica-Bold', marginBottom: 4 },
  h2: { fontSize: 13, fontFamily: 'Helvetica-Bold', marginTop: 14, marginBottom: 6 },
  muted: { color: '#5b4a3a' },
  row: { flexDirection: 'row', borderBottom: '0.5pt solid #d9c6a5', paddingVertical: 2 },
  cell: { flex: 3 },
  num: { flex: 1, textAlign: 'right' },
  board: { marginBottom: 8 },
  bold: { fontFamily: 'Helvetica-Bold' },
  caution: { marginTop: 16, fontSize: 8, color: '#5b4a3a' },
});

export type CutSheetData = {
  plan: PlanViewData;
  job: { reference: string; customerName: string; dueDate: string | null };
  yardName: string;
  offcutTags: Record<number, string>;
  format: (mm: number) => string;
  quote: QuoteView;
  /** The customer's copy leaves out rack tags and what the yard keeps. */
  forCustomer: boolean;
  remaindersGoTo: 'yard' | 'customer';
};

export function CutSheetDocument({
  plan,
  job,
  yardName,
  offcutTags,
  format,
  quote,
  forCustomer,
  remaindersGoTo,
}: CutSheetData) {
  const remainderNote = (keep: boolean, mm: number) => {
    if (!keep) return `scrap ${format(mm)}`;
    if (remaindersGoTo === 'customer') return `remainder ${format(mm)} is yours to take`;
    return forCustomer ? 'remainder stays at the yard' : `keep ${format(mm)} for the rack`;
  };
  const sourceNote = (offcutId: number | null) =>
    forCustomer || !offcutId ? 'offcut' : `offcut ${offcutTags[offcutId] ?? ''}`;
  return (
    <Document title={`Cut sheet ${job.reference}`} author={yardName}>
      <Page size="A4" style={s.page}>
        <Text style={s.h1}>Cut sheet · {job.reference}</Text>
        <Text>
          {job.customerName}
          {job.dueDate ? ` · due ${formatCustomerDate(job.dueDate)}` : ''}
        </Text>
        <Text style={s.muted}>
          {yardName} · plan {plan.id} · kerf {plan.settings.kerfMm} mm · end trim {plan.settings.trimMm} mm
        </Text>
        {plan.sections.map((section) => {
          const boards = plan.boards.filter((b) => b.sectionId === section.sectionId);
          const pieces = new Map<
            string,
            { label: string; lengthMm: number; count: number; angle: string | null; cuts: number[] }
          >();
          for (const b of boards)
            for (const p of b.pieces) {
              const key = `${p.lengthMm}|${p.label}`;
              const e = pieces.get(key) ?? {
                label: p.label,
                lengthMm: p.lengthMm,
                count: 0,
                angle: angleLine(p, format),
                cuts: [],
              };
              e.count += 1;
              e.cuts.push(actualCutMm(p));
              pieces.set(key, e);
            }
          return (
            <View key={section.sectionId}>
              <Text style={s.h2}>{section.sectionName}</Text>
              {[...pieces.values()]
                .sort((a, b) => b.lengthMm - a.lengthMm)
                .map((p) => (
                  <View key={`${p.lengthMm}|${p.label}`} style={s.row}>
                    <Text style={s.cell}>
                      {p.label || 'piece'}
                      {p.angle ? `\n${p.angle}` : ''}
                      {p.cuts.some((c) => c !== p.lengthMm)
                        ? `\nnominal, cut to ${cutRange(p.cuts, format)}`
                        : ''}
                    </Text>
                    <Text style={s.num}>{format(p.lengthMm)}</Text>
                    <Text style={s.num}>× {p.count}</Text>
                  </View>
                ))}
              <Text style={[s.bold, { marginTop: 8, marginBottom: 4 }]}>Boards</Text>
              {groupIdenticalBoards(boards).map(({ key, boards: same, first }) => (
                <View key={key} style={s.board} wrap={false}>
                  <Text>
                    {same.length} × {first.source === 'offcut' ? sourceNote(first.offcutId) : 'new'}{' '}
                    {format(first.lengthMm)}:{' '}
                    {first.fullLength
                      ? `${first.pieces.map((p) => format(p.lengthMm)).join('')}, ${FULL_LENGTH_WORDS}`
                      : `${first.pieces.map((p) => cutLengthText(p, format)).join(' + ')} · ${remainderNote(first.keepRemainder, first.remainderMm)}`}
                  </Text>
                  <PdfBoard
                    format={format}
                    board={{
                      lengthMm: first.lengthMm,
                      trimMm: first.trimMm,
                      kerfMm: plan.settings.kerfMm,
                      pieces: first.pieces,
                      remainderMm: first.remainderMm,
                      keepRemainder: first.keepRemainder,
                    }}
                  />
                </View>
              ))}
            </View>
          );
        })}
        <Text style={s.muted}>
          Green: pieces · black: saw kerf · dotted amber: kept remainder · hatched red: scrap or end trim.
        </Text>
        <PdfQuote quote={quote} />
        <Text style={s.caution}>
          Kerfwise counts and cuts timber; it does not size structure. Check sizes and spans against local
          building rules or an engineer. Cutting treated timber: wear a dust mask and gloves, wash before
          eating, never burn offcuts.
        </Text>
      </Page>
    </Document>
  );
}
