import type { FrameItem } from '@/lib/frames';
import type { FrameSectionOption } from '@/lib/frames-data/frame-section-option';
import type { DisplayUnit } from '@/lib/units';
import { formatLength } from '@/lib/units';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';

/** Every piece: its mark on the drawings, where it goes, section, length, count and any angled cut. */
export function PieceScheduleTable({
  items,
  sections,
  unit,
}: {
  items: FrameItem[];
  sections: FrameSectionOption[];
  unit: DisplayUnit;
}) {
  const sectionName = (id: number) => sections.find((s) => s.id === id)?.name ?? `Section ${id}`;
  const totals = new Map<number, { pieces: number; mm: number }>();
  for (const item of items) {
    const t = totals.get(item.sectionId) ?? { pieces: 0, mm: 0 };
    totals.set(item.sectionId, { pieces: t.pieces + item.quantity, mm: t.mm + item.quantity * item.length });
  }
  return (
    <ScrollRegion label="Pieces of the schedule">
      <Table data-testid="piece-schedule">
        <TableHead
          density="snug"
          columns={[
            'Mark',
            'Piece',
            'Section',
            { label: 'Length', numeric: true },
            { label: 'Qty', numeric: true },
            { label: 'Angle', numeric: true },
          ]}
        />
        <tbody>
          {items.map((item) => (
            <TableRow key={item.mark}>
              <Cell density="snug" className="font-mono text-sm">
                {item.mark}
              </Cell>
              <Cell density="snug">
                {item.label}
                {item.note && <span className="block text-sm text-bark-soft">{item.note}</span>}
              </Cell>
              <Cell density="snug" className="text-sm">
                {sectionName(item.sectionId)}
              </Cell>
              <Cell density="snug" numeric className="font-mono">
                {formatLength(item.length, unit)}
              </Cell>
              <Cell density="snug" numeric className="font-mono">
                {item.quantity}
              </Cell>
              <Cell density="snug" numeric className="font-mono">
                {item.angle ? `${item.angle.toFixed(1)}°` : ''}
              </Cell>
            </TableRow>
          ))}
        </tbody>
        <tfoot className="border-t-2 border-grain text-sm">
          {[...totals].map(([id, t]) => (
            <tr key={id} data-testid="section-total">
              <td />
              <Cell density="snug" className="font-semibold" colSpan={2}>
                Total {sectionName(id)}
              </Cell>
              <Cell density="snug" numeric className="font-mono">
                {unit === 'mm' ? `${(t.mm / 1000).toFixed(1)} m` : formatLength(t.mm, unit)}
              </Cell>
              <Cell density="snug" numeric className="font-mono">
                {t.pieces}
              </Cell>
              <td />
            </tr>
          ))}
        </tfoot>
      </Table>
    </ScrollRegion>
  );
}
