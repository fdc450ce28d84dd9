'use client';

import { cn } from '@/lib/cn';
import type { DisplayUnit } from '@/lib/units';
import { useDisplayUnit } from './display-unit';

/** Switches how lengths are shown for this person: millimetres or feet-inches. */
export function UnitToggle() {
  const { unit, setUnit } = useDisplayUnit();
  const option = (value: DisplayUnit, label: string) => (
    <button
      type="button"
      aria-pressed={unit === value}
      onClick={() => setUnit(value)}
      className={cn(
        'min-h-9 px-3 text-sm font-semibold first:rounded-l-md last:rounded-r-md',
        unit === value ? 'bg-spruce text-white' : 'bg-white text-bark hover:bg-shaving',
      )}
    >
      {label}
    </button>
  );
  return (
    <div
      role="group"
      aria-label="Show lengths in"
      // No overflow clipping here: it would cut off the focus ring.
      className="no-print inline-flex rounded-lg border-2 border-grain"
    >
      {option('mm', 'mm')}
      {option('imperial', 'ft-in')}
    </div>
  );
}
