import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import type { ReportRange } from '@/lib/reports/report-range';

const DAY_MS = 86_400_000;
const day = (t: number) => new Date(t).toISOString().slice(0, 10);

/** A plain GET form: the range lives in the address, so a report can be bookmarked or shared. */
export function ReportRangeForm({ range, today }: { range: ReportRange; today: string }) {
  const end = Date.parse(`${today}T00:00:00Z`);
  const presets = [
    ['Last 4 weeks', 27],
    ['Last 12 weeks', 83],
    ['Last 6 months', 182],
  ] as const;
  return (
    <form method="get" className="flex flex-wrap items-end gap-3" data-testid="report-range">
      <label>
        <span className="block text-sm font-semibold">From</span>
        <input className={inputClass} type="date" name="from" defaultValue={range.from} required />
      </label>
      <label>
        <span className="block text-sm font-semibold">To</span>
        <input className={inputClass} type="date" name="to" defaultValue={range.to} required />
      </label>
      <Button type="submit">Show</Button>
      <div className="flex flex-wrap gap-1">
        {presets.map(([label, days]) => (
          <a
            key={label}
            className="rounded-lg px-3 py-2 text-sm font-semibold text-spruce underline"
            href={`?from=${day(end - days * DAY_MS)}&to=${today}`}
          >
            {label}
          </a>
        ))}
      </div>
    </form>
  );
}
