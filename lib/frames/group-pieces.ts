import type { FrameItem, FramePiece } from './types';

/** "1–3, 7" from [1, 2, 3, 7]. */
export function formatNumberRanges(numbers: number[]): string {
  const sorted = [...numbers].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < sorted.length;) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j++;
    parts.push(
      j === i ? `${sorted[i]}` : j === i + 1 ? `${sorted[i]}, ${sorted[j]}` : `${sorted[i]}–${sorted[j]}`,
    );
    i = j + 1;
  }
  return parts.join(', ');
}

const pieceKey = (p: FramePiece) =>
  [
    p.panelIndex,
    p.label,
    p.sectionId,
    Math.round(p.length),
    p.angle ? p.angle.toFixed(1) : '',
    p.note ?? '',
    p.nominal ? 'nominal' : '',
  ].join('\u0000');

/**
 * Identical pieces of a panel become one item with a quantity; lengths round to whole mm.
 * When pieces sharing a label differ, each item's label names its pieces ("side wall stud 3").
 */
export function groupPieces(pieces: FramePiece[]): { items: FrameItem[]; markOf: Map<FramePiece, string> } {
  const groups = new Map<string, FramePiece[]>();
  const ordered = [...pieces].sort((a, b) => a.panelIndex - b.panelIndex);
  for (const p of ordered) {
    const key = pieceKey(p);
    groups.set(key, [...(groups.get(key) ?? []), p]);
  }
  const groupsPerLabel = new Map<string, number>();
  for (const [first] of groups.values()) {
    const labelKey = `${first.panelIndex}\u0000${first.label}`;
    groupsPerLabel.set(labelKey, (groupsPerLabel.get(labelKey) ?? 0) + 1);
  }
  const items: FrameItem[] = [];
  const markOf = new Map<FramePiece, string>();
  const perPanel = new Map<number, number>();
  for (const group of groups.values()) {
    const first = group[0];
    const k = (perPanel.get(first.panelIndex) ?? 0) + 1;
    perPanel.set(first.panelIndex, k);
    const mark = `${first.panelIndex + 1}.${k}`;
    const shared = (groupsPerLabel.get(`${first.panelIndex}\u0000${first.label}`) ?? 1) > 1;
    const item: FrameItem = {
      mark,
      panelIndex: first.panelIndex,
      label: shared ? `${first.label} ${formatNumberRanges(group.map((p) => p.number))}` : first.label,
      sectionId: first.sectionId,
      length: Math.round(first.length),
      quantity: group.length,
    };
    if (first.angle) item.angle = first.angle;
    if (first.note) item.note = first.note;
    if (first.nominal) item.nominal = true;
    items.push(item);
    for (const p of group) markOf.set(p, mark);
  }
  return { items, markOf };
}
