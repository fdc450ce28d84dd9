'use client';

import { useState } from 'react';
import { inputClass } from '@/components/ui/field';
import { MAX_TOLERANCE_MM } from '@/lib/nominal/tolerance';

/**
 * Exact or nominal for one line. Nominal starts at the section's (or the yard's) tolerance, and the
 * yard hand may change it; a nominal piece may be cut up to that many mm short.
 */
export function FitFields({
  formId,
  name,
  toleranceMm,
  nominalDefaultMm,
}: {
  formId: string;
  name: string;
  toleranceMm: number;
  nominalDefaultMm: number;
}) {
  const [nominal, setNominal] = useState(toleranceMm > 0);
  const [tolerance, setTolerance] = useState(toleranceMm > 0 ? String(toleranceMm) : '');
  return (
    <div className="flex items-center gap-2">
      <select
        form={formId}
        name="fit"
        aria-label={`Exact or nominal, ${name}`}
        className={inputClass}
        value={nominal ? 'nominal' : 'exact'}
        onChange={(e) => {
          const next = e.target.value === 'nominal';
          setNominal(next);
          if (next && tolerance === '') setTolerance(String(nominalDefaultMm));
        }}
      >
        <option value="exact">Exact</option>
        <option value="nominal">Nominal</option>
      </select>
      {nominal && (
        <label className="flex items-center gap-1 text-sm whitespace-nowrap">
          up to
          <input
            form={formId}
            name="toleranceMm"
            type="number"
            min={0}
            max={MAX_TOLERANCE_MM}
            aria-label={`Millimetres short allowed, ${name}`}
            className={`${inputClass} w-16 text-right`}
            value={tolerance}
            onChange={(e) => setTolerance(e.target.value)}
          />
          mm short
        </label>
      )}
    </div>
  );
}
