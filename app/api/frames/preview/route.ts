// POST /api/frames/preview – the cut list of unsaved panels, for the editor's live preview
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { framePreviewBodySchema } from '@/lib/frames';
import { previewFrameSchedule } from '@/lib/frames-data/preview-frame-schedule';

export const POST = route('frames:edit', async ({ req }) => {
  const body = await parseJsonBody(req, framePreviewBodySchema);
  const { items, warnings, notice } = await previewFrameSchedule({ panels: body.panels });
  return NextResponse.json({ unit: body.unit, panels: body.panels, items, warnings, notice });
});
