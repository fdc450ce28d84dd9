import { buildSchedulePieces } from './build-schedule-pieces';
import { groupPieces } from './group-pieces';
import { FRAME_STRUCTURE_NOTICE } from './notice';
import type { FrameSchedulePanel } from './panel-schemas';
import type { FrameContext, FrameItemsResult } from './types';

/**
 * The cut list of a validated frame schedule: one item per distinct piece of each panel, with a
 * mark matching the panel drawings. `sections` gives each section id's thickness and width.
 */
export function generateFrameItems(panels: FrameSchedulePanel[], ctx: FrameContext): FrameItemsResult {
  const { pieces, warnings } = buildSchedulePieces(panels, ctx);
  const { items } = groupPieces(pieces);
  for (const item of items) {
    if (item.length <= 0) warnings.push(`${item.label}: works out at ${item.length} mm and cannot be cut`);
    else if (ctx.minPieceMm && item.length < ctx.minPieceMm)
      warnings.push(tinyPieceWarning(item, ctx.minPieceMm));
  }
  return { items: items.filter((item) => item.length > 0), warnings, notice: FRAME_STRUCTURE_NOTICE };
}

/** Common practice, no published source: close a tiny gap with a deeper lintel, or fill it with packers. */
function tinyPieceWarning(item: { mark: string; label: string; length: number }, minPieceMm: number) {
  const fix = /noggin/i.test(item.label)
    ? 'move the noggin row or a stud so the bay is wider, or fit packers instead'
    : 'a deeper lintel to close the gap, or packers instead of a short piece';
  return `${item.mark} ${item.label}: ${item.length} mm is shorter than the yard's minimum safe piece length (${minPieceMm} mm) and cannot be held safely at the saw. The usual fix: ${fix}.`;
}
