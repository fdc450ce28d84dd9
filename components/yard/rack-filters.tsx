'use client';

import { inputClass } from '@/components/ui/field';
import type { RackFilters } from '@/lib/queries/offcuts';

const STATUS_CHOICES = [
  ['on_rack', 'On the rack'],
  ['available', 'Available'],
  ['reserved', 'Reserved'],
  ['used', 'Used'],
  ['scrapped', 'Scrapped'],
  ['all', 'Any status'],
] as const;

type Props = {
  filters: RackFilters;
  onChange: (change: Partial<RackFilters>) => void;
  sections: { id: number; name: string }[];
  locations: string[];
  clearAfterDays: number;
};

/** Search and filters for the rack; every change returns to page 1. */
export function RackFiltersBar({ filters, onChange, sections, locations, clearAfterDays }: Props) {
  const set = (change: Partial<RackFilters>) => onChange({ ...change, page: '1' });
  const small = `${inputClass} text-sm`;
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4 xl:grid-cols-7" data-testid="rack-filters">
      <label className="lg:col-span-2">
        <span className="text-sm font-semibold">Search</span>
        <input
          className={small}
          type="search"
          value={filters.q}
          onChange={(e) => set({ q: e.target.value })}
          placeholder="Tag, location, job…"
        />
      </label>
      <label>
        <span className="text-sm font-semibold">Section</span>
        <select
          className={small}
          value={filters.sectionId}
          onChange={(e) => set({ sectionId: e.target.value })}
        >
          <option value="">Every section</option>
          {sections.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
      </label>
      <div>
        <span className="text-sm font-semibold">Length (mm)</span>
        <div className="flex gap-1">
          <input
            aria-label="Shortest length in mm"
            className={small}
            type="number"
            min={0}
            value={filters.minLengthMm}
            onChange={(e) => set({ minLengthMm: e.target.value })}
            placeholder="from"
          />
          <input
            aria-label="Longest length in mm"
            className={small}
            type="number"
            min={0}
            value={filters.maxLengthMm}
            onChange={(e) => set({ maxLengthMm: e.target.value })}
            placeholder="to"
          />
        </div>
      </div>
      <label>
        <span className="text-sm font-semibold">Location</span>
        <select
          className={small}
          value={filters.location}
          onChange={(e) => set({ location: e.target.value })}
        >
          <option value="">Anywhere</option>
          {locations.map((l) => (
            <option key={l} value={l}>
              {l}
            </option>
          ))}
        </select>
      </label>
      <div className="grid grid-cols-2 gap-1 lg:col-span-2">
        <label>
          <span className="text-sm font-semibold">Age</span>
          <select
            className={small}
            value={filters.minAgeDays}
            onChange={(e) => set({ minAgeDays: e.target.value })}
          >
            <option value="">Any age</option>
            <option value="30">30+ days</option>
            <option value="60">60+ days</option>
            <option value={String(clearAfterDays)}>{clearAfterDays}+ days (clear)</option>
            <option value="180">180+ days</option>
          </select>
        </label>
        <label>
          <span className="text-sm font-semibold">Status</span>
          <select className={small} value={filters.status} onChange={(e) => set({ status: e.target.value })}>
            {STATUS_CHOICES.map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        </label>
      </div>
    </div>
  );
}
