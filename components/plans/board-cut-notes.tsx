import { actualCutMm, cutDiffers } from '@/lib/plans/cut-words';
import type { BoardPiece } from '@/lib/plans/plan-shapes';

/** Under a board's drawing: the nominal pieces the saw cuts shorter than listed, with both lengths. */
export function BoardCutNotes({ pieces, format }: { pieces: BoardPiece[]; format: (mm: number) => string }) {
  const short = pieces.filter(cutDiffers);
  if (short.length === 0) return null;
  return (
    <p className="mt-1 text-sm" data-testid="actual-cuts">
      <span className="font-semibold">Nominal, cut to:</span>{' '}
      {short
        .map((p) => `${p.label || 'piece'} ${format(actualCutMm(p))} (listed ${format(p.lengthMm)})`)
        .join(' · ')}
    </p>
  );
}
