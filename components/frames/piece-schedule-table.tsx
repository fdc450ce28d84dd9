import type { FrameItem } from '@/lib/frames';
import type { FrameSectionOption } from '@/lib/frames-data/frame-section-option';
import type { DisplayUnit } from '@/lib/units';
import { formatLength } from '@/lib/units';
import { ScrollRegion } from '@/components/ui/scroll-region';

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
      <table className="w-full text-left" data-testid="piece-schedule">
        <thead className="bg-shaving text-sm">
          <tr>
            <th className="p-2">Mark</th>
            <th className="p-2">Piece</th>
            <th className="p-2">Section</th>
            <th className="p-2 text-right">Length</th>
            <th className="p-2 text-right">Qty</th>
            <th className="p-2 text-right">Angle</th>
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr key={item.mark} className="border-t border-shaving">
              <td className="p-2 font-mono text-sm">{item.mark}</td>
              <td className="p-2">
                {item.label}
                {item.note && <span className="block text-sm text-bark-soft">{item.note}</span>}
              </td>
              <td className="p-2 text-sm">{sectionName(item.sectionId)}</td>
              <td className="p-2 text-right font-mono">{formatLength(item.length, unit)}</td>
              <td className="p-2 text-right font-mono">{item.quantity}</td>
              <td className="p-2 text-right font-mono">{item.angle ? `${item.angle.toFixed(1)}°` : ''}</td>
            </tr>
          ))}
        </tbody>
        <tfoot className="border-t-2 border-grain text-sm">
          {[...totals].map(([id, t]) => (
            <tr key={id} data-testid="section-total">
              <td />
              <td className="p-2 font-semibold" colSpan={2}>
                Total {sectionName(id)}
              </td>
              <td className="p-2 text-right font-mono">
                {unit === 'mm' ? `${(t.mm / 1000).toFixed(1)} m` : formatLength(t.mm, unit)}
              </td>
              <td className="p-2 text-right font-mono">{t.pieces}</td>
              <td />
            </tr>
          ))}
        </tfoot>
      </table>
    </ScrollRegion>
  );
}
