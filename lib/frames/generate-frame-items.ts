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
  }
  return { items: items.filter((item) => item.length > 0), warnings, notice: FRAME_STRUCTURE_NOTICE };
}
