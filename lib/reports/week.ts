// Reports group by week: weeks start on Monday (ISO 8601), dated in UTC.
const DAY_MS = 86_400_000;

/** The Monday (YYYY-MM-DD) of the week holding `at`. */
export function weekStartOf(at: Date): string {
  const day = Date.UTC(at.getUTCFullYear(), at.getUTCMonth(), at.getUTCDate());
  const sinceMonday = (new Date(day).getUTCDay() + 6) % 7;
  return new Date(day - sinceMonday * DAY_MS).toISOString().slice(0, 10);
}

/** Every week start from the week of `from` to the week of `to`, so empty weeks show as zero. */
export function weekStartsBetween(from: Date, to: Date): string[] {
  const weeks: string[] = [];
  const last = Date.parse(weekStartOf(to));
  for (let t = Date.parse(weekStartOf(from)); t <= last; t += 7 * DAY_MS) {
    weeks.push(new Date(t).toISOString().slice(0, 10));
  }
  return weeks;
}

export const daysBetween = (earlier: Date, later: Date) =>
  Math.floor((later.getTime() - earlier.getTime()) / DAY_MS);
