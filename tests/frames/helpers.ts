import {
  framePreviewBodySchema,
  type FrameSchedulePanel,
  type FrameSchedulePanelInput,
  type SectionDimensions,
} from '@/lib/frames';

// Invented yard sections for tests: 1 = 47×100 framing, 2 = 19×125 cladding, 3 = 22×150 ledges.
export const sections = new Map<number, SectionDimensions>([
  [1, { thickness: 47, width: 100 }],
  [2, { thickness: 19, width: 125 }],
  [3, { thickness: 22, width: 150 }],
]);

export function parsePanels(panels: FrameSchedulePanelInput[]): FrameSchedulePanel[] {
  return framePreviewBodySchema.parse({ unit: 'mm', panels }).panels;
}
