import { FRAME_STRUCTURE_NOTICE } from './notice';

export type FrameLineItem = {
  sectionId: number;
  length: number;
  label: string;
  quantity: number;
  note?: string;
};

/**
 * Line items for a job: quantities summed where section, length and label agree, so the same
 * piece listed by two panels (or twice in one) is sent once. Sorted by section, then longest first.
 */
export function sumItemsBySection(
  items: readonly { sectionId: number; length: number; label: string; quantity: number; note?: string }[],
): { lineItems: FrameLineItem[]; notice: string } {
  const sums = new Map<string, FrameLineItem>();
  for (const item of items) {
    const length = Math.round(item.length);
    const key = `${item.sectionId}\u0000${length}\u0000${item.label}`;
    const found = sums.get(key);
    if (found) {
      found.quantity += item.quantity;
      if (item.note && !(found.note ?? '').split('; ').includes(item.note))
        found.note = found.note ? `${found.note}; ${item.note}` : item.note;
    } else
      sums.set(key, {
        sectionId: item.sectionId,
        length,
        label: item.label,
        quantity: item.quantity,
        ...(item.note ? { note: item.note } : {}),
      });
  }
  const lineItems = [...sums.values()].sort(
    (a, b) => a.sectionId - b.sectionId || b.length - a.length || a.label.localeCompare(b.label),
  );
  return { lineItems, notice: FRAME_STRUCTURE_NOTICE };
}
