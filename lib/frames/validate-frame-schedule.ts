import { framePreviewBodySchema, type FramePreviewBody } from './frame-preview-body-schema';
import { FRAME_STRUCTURE_NOTICE } from './notice';
import type { SectionDimensions } from './types';

export type FrameValidationError = { path: string; message: string };

export type FrameValidationResult =
  | { ok: true; value: FramePreviewBody; errors: []; notice: string }
  | { ok: false; errors: FrameValidationError[]; notice: string };

const SECTION_FIELDS = [
  'sectionId',
  'headSectionId',
  'bearerSectionId',
  'fasciaSectionId',
  'boardSectionId',
] as const;

/**
 * Validates a frame schedule and flattens errors to `{ path: "panels.2.highHeight", message }`.
 * With `sections`, every section id must also be one the yard has.
 */
export function validateFrameSchedule(
  input: unknown,
  options: { sections?: ReadonlyMap<number, SectionDimensions> } = {},
): FrameValidationResult {
  const parsed = framePreviewBodySchema.safeParse(input);
  if (!parsed.success) {
    const errors = parsed.error.issues.map((issue) => ({
      path: issue.path.map(String).join('.'),
      message: issue.message,
    }));
    return { ok: false, errors, notice: FRAME_STRUCTURE_NOTICE };
  }
  const errors: FrameValidationError[] = [];
  if (options.sections) {
    parsed.data.panels.forEach((panel, index) => {
      for (const field of SECTION_FIELDS) {
        const id = (panel as Record<string, unknown>)[field];
        if (typeof id === 'number' && !options.sections!.has(id))
          errors.push({
            path: `panels.${index}.${field}`,
            message: `Section ${id} is not in the yard's section list`,
          });
      }
    });
  }
  if (errors.length > 0) return { ok: false, errors, notice: FRAME_STRUCTURE_NOTICE };
  return { ok: true, value: parsed.data, errors: [], notice: FRAME_STRUCTURE_NOTICE };
}
