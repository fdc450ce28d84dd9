import { z } from 'zod';
import { DISPLAY_UNITS } from '@/db/enums';
import { findGeometryIssues } from './find-geometry-issues';
import { frameSchedulePanelSchema } from './panel-schemas';

export const frameUnitSchema = z.enum(DISPLAY_UNITS, { error: 'Unit must be mm or imperial' });

/** A whole frame schedule: shape checks per field, then geometry checks across fields and panels. */
export const framePreviewBodySchema = z
  .object({
    unit: frameUnitSchema.default('mm'),
    panels: z
      .array(frameSchedulePanelSchema, { error: 'Panels must be a list' })
      .min(1, { error: 'Add at least one panel' })
      .max(100, { error: 'A frame schedule holds at most 100 panels' }),
  })
  .superRefine((body, ctx) => {
    for (const issue of findGeometryIssues(body.panels)) {
      ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
    }
  });

export type FramePreviewBody = z.output<typeof framePreviewBodySchema>;
export type FramePreviewBodyInput = z.input<typeof framePreviewBodySchema>;
