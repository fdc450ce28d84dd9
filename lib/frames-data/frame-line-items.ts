import { sumItemsBySection, type FrameItem } from '@/lib/frames';

export type FrameJobLine = {
  sectionId: number;
  length: number;
  label: string;
  quantity: number;
  note: string;
  angleTenths: number | null;
};

/**
 * A schedule's items as job line items: summed where section, length, label and angle agree,
 * so a piece listed by two panels is sent once; angles kept in tenths of a degree.
 */
export function toFrameJobLines(items: readonly FrameItem[]): FrameJobLine[] {
  const angleTenths = (angle?: number) => (angle ? Math.round(angle * 10) : null);
  // Fold the angle into the label key so a square and an angled piece of one length never merge.
  const keyed = items.map((item) => ({
    ...item,
    label: `${item.label}\u0000${angleTenths(item.angle) ?? ''}`,
  }));
  return sumItemsBySection(keyed).lineItems.map((line) => {
    const [label, tenths] = line.label.split('\u0000');
    return {
      sectionId: line.sectionId,
      length: line.length,
      label,
      quantity: line.quantity,
      note: line.note ?? '',
      angleTenths: tenths ? Number(tenths) : null,
    };
  });
}
