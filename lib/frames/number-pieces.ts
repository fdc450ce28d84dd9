import type { FramePiece } from './types';

const left = (p: FramePiece) => (p.outline.length ? Math.min(...p.outline.map((q) => q.x)) : Infinity);
const bottom = (p: FramePiece) => (p.outline.length ? Math.min(...p.outline.map((q) => q.y)) : Infinity);

/** Numbers pieces sharing a panel and label 1, 2, 3 … left to right, then bottom to top. */
export function numberPieces(pieces: FramePiece[]): FramePiece[] {
  const byLabel = new Map<string, FramePiece[]>();
  for (const p of pieces) {
    const key = `${p.panelIndex}\u0000${p.label}`;
    byLabel.set(key, [...(byLabel.get(key) ?? []), p]);
  }
  const numbered = new Map<FramePiece, number>();
  for (const group of byLabel.values()) {
    [...group]
      .sort((a, b) => left(a) - left(b) || bottom(a) - bottom(b))
      .forEach((p, k) => numbered.set(p, k + 1));
  }
  return pieces.map((p) => ({ ...p, number: numbered.get(p) ?? 1 }));
}
