// The date range every report reads: `from` and `to` are whole days, both included.
import { z } from 'zod';

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-09-01.');

export const reportRangeSchema = z
  .object({ from: day, to: day })
  .refine(
    (r) => !Number.isNaN(Date.parse(r.from)) && !Number.isNaN(Date.parse(r.to)),
    'That is not a real date.',
  )
  .refine((r) => r.from <= r.to, { message: 'The start date must not be after the end date.', path: ['to'] })
  .refine((r) => Date.parse(r.to) - Date.parse(r.from) <= 3 * 366 * 86_400_000, {
    message: 'Choose a range of three years or less.',
    path: ['to'],
  });
export type ReportRange = z.infer<typeof reportRangeSchema>;

/** The instants a range covers: from midnight UTC on `from` up to (not including) the day after `to`. */
export function rangeBounds(range: ReportRange): { start: Date; end: Date } {
  return {
    start: new Date(`${range.from}T00:00:00Z`),
    end: new Date(Date.parse(`${range.to}T00:00:00Z`) + 86_400_000),
  };
}

/** The last twelve weeks up to `now`, the default range. */
export function defaultReportRange(now: Date): ReportRange {
  const to = now.toISOString().slice(0, 10);
  const from = new Date(now.getTime() - 83 * 86_400_000).toISOString().slice(0, 10);
  return { from, to };
}

/** The range asked for in a page's query, or the default when it is missing or wrong (with the reason). */
export function readReportRange(
  params: { from?: string; to?: string },
  now = new Date(),
): { range: ReportRange; problem: string | null } {
  if (!params.from && !params.to) return { range: defaultReportRange(now), problem: null };
  const parsed = reportRangeSchema.safeParse(params);
  if (parsed.success) return { range: parsed.data, problem: null };
  return {
    range: defaultReportRange(now),
    problem: `${parsed.error.issues[0]?.message ?? 'That range is not valid.'} Showing the last twelve weeks instead.`,
  };
}
