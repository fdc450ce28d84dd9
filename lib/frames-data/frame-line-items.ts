import { sumItemsBySection, type FrameItem } from '@/lib/frames';

export type FrameJobLine = {
  sectionId: number;
  length: number;
  label: string;
  quantity: number;
  note: string;
  angleTenths: number | null;
  /** The schedule's piece marks this line covers, e.g. "1.1, 2.3". */
  marks: string;
  /** Sold by nominal length (cladding, common studs): the job takes the section's tolerance. */
  nominal: boolean;
};

const angleTenths = (angle?: number) => (angle ? Math.round(angle * 10) : null);
const lineKey = (sectionId: number, length: number, label: string) =>
  `${sectionId}\u0000${Math.round(length)}\u0000${label}`;

/** "1.1, 1.2, 2.3" in panel then piece order. */
function joinMarks(marks: string[]): string {
  const byPanel = new Map<string, number[]>();
  for (const mark of marks) {
    const [panel, piece] = mark.split('.');
    byPanel.set(panel, [...(byPanel.get(panel) ?? []), Number(piece)]);
  }
  return [...byPanel.entries()]
    .sort(([a], [b]) => Number(a) - Number(b))
    .flatMap(([panel, pieces]) => [...new Set(pieces)].sort((a, b) => a - b).map((p) => `${panel}.${p}`))
    .join(', ');
}

/**
 * A schedule's items as job line items: summed where section, length, label and angle agree,
 * so a piece listed by two panels is sent once; angles kept in tenths of a degree, and the piece
 * marks of every item summed into a line kept with it.
 */
export function toFrameJobLines(items: readonly FrameItem[]): FrameJobLine[] {
  // Fold the angle (and nominal) into the label key so a square and an angled piece, or a nominal and
  // an exact one, of one length never merge.
  const keyed = items.map((item) => ({
    ...item,
    label: `${item.label}\u0000${angleTenths(item.angle) ?? ''}\u0000${item.nominal ? 'n' : ''}`,
  }));
  const marks = new Map<string, string[]>();
  for (const item of keyed) {
    const key = lineKey(item.sectionId, item.length, item.label);
    marks.set(key, [...(marks.get(key) ?? []), item.mark]);
  }
  return sumItemsBySection(keyed).lineItems.map((line) => {
    const [label, tenths, nominal] = line.label.split('\u0000');
    return {
      sectionId: line.sectionId,
      length: line.length,
      label,
      quantity: line.quantity,
      note: line.note ?? '',
      angleTenths: tenths ? Number(tenths) : null,
      marks: joinMarks(marks.get(lineKey(line.sectionId, line.length, line.label)) ?? []),
      nominal: nominal === 'n',
    };
  });
}
