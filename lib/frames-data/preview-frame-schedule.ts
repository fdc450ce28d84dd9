import 'server-only';
import { generateFrameItems, type FrameSchedulePanel } from '@/lib/frames';
import { assertKnownSections } from './assert-known-sections';
import { getYardFrameSections } from './get-yard-frame-sections';

/** The cut list of unsaved panels, for the editor's live preview. Unknown sections answer 422. */
export async function previewFrameSchedule({ panels }: { panels: FrameSchedulePanel[] }) {
  const { dimensions, context } = await getYardFrameSections();
  assertKnownSections(panels, dimensions);
  return generateFrameItems(panels, context);
}
