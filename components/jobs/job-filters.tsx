'use client';

import { JOB_STATUSES } from '@/db/enums';
import { inputClass } from '@/components/ui/field';
import type { JobFilters as Filters } from '@/lib/queries/jobs';

/** Search and filter controls for the job list; every change filters at once. */
export function JobFilters({ value, onChange }: { value: Filters; onChange: (next: Filters) => void }) {
  const set = (key: keyof Filters) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) =>
    onChange({ ...value, [key]: e.target.value });
  return (
    <form
      role="search"
      className="mb-4 grid gap-3 sm:grid-cols-3 lg:grid-cols-5"
      onSubmit={(e) => e.preventDefault()}
    >
      <label className="text-sm font-semibold">
        Reference or customer
        <input
          type="search"
          className={inputClass}
          value={value.q ?? ''}
          onChange={set('q')}
          placeholder="J-1001 or a name"
        />
      </label>
      <label className="text-sm font-semibold">
        Show
        <select
          className={inputClass}
          value={value.show ?? ''}
          onChange={set('show')}
          disabled={Boolean(value.status)}
          data-testid="job-show"
        >
          <option value="">Open jobs</option>
          <option value="closed">Done and cancelled</option>
          <option value="all">All jobs, open first</option>
        </select>
      </label>
      <label className="text-sm font-semibold">
        Status
        <select className={inputClass} value={value.status ?? ''} onChange={set('status')}>
          <option value="">Any status</option>
          {JOB_STATUSES.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm font-semibold">
        Due from
        <input type="date" className={inputClass} value={value.dueFrom ?? ''} onChange={set('dueFrom')} />
      </label>
      <label className="text-sm font-semibold">
        Due by
        <input type="date" className={inputClass} value={value.dueTo ?? ''} onChange={set('dueTo')} />
      </label>
    </form>
  );
}
