import { ZodError } from 'zod';
import type { FrameSchedulePanel, SectionDimensions } from '@/lib/frames';

const SECTION_FIELDS = [
  'sectionId',
  'headSectionId',
  'bearerSectionId',
  'fasciaSectionId',
  'boardSectionId',
] as const;

/** Throws a 422-shaped ZodError naming each panel field whose section the yard does not have. */
export function assertKnownSections(
  panels: FrameSchedulePanel[],
  sections: ReadonlyMap<number, SectionDimensions>,
): void {
  const issues: ZodError['issues'] = [];
  panels.forEach((panel, index) => {
    for (const field of SECTION_FIELDS) {
      const id = (panel as Record<string, unknown>)[field];
      if (typeof id === 'number' && !sections.has(id))
        issues.push({
          code: 'custom',
          path: ['panels', index, field],
          message: `Section ${id} is not in the yard's section list`,
          input: id,
        });
    }
  });
  if (issues.length > 0) throw new ZodError(issues);
}
