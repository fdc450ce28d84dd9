'use client';

import { useState } from 'react';
import { inputClass } from '@/components/ui/field';
import { MAX_TOLERANCE_MM } from '@/lib/nominal/tolerance';

/** Exact or nominal for one line: nominal, and the millimetres it may be short as typed. */
export type Fit = { nominal: boolean; toleranceText: string };

/** The row's fit, starting from the line's stored tolerance (0: exact). */
export function useFit(toleranceMm: number) {
  return useState<Fit>({
    nominal: toleranceMm > 0,
    toleranceText: toleranceMm > 0 ? String(toleranceMm) : '',
  });
}

/** What the item routes take: exact is 0; nominal with the box empty takes the section's or yard's figure. */
export const fitBody = (fit: Fit) => ({
  nominal: fit.nominal,
  toleranceMm: !fit.nominal ? 0 : fit.toleranceText.trim() === '' ? null : Number(fit.toleranceText),
});

/**
 * Exact or nominal for one line. Nominal starts at the section's (or the yard's) tolerance, and the
 * yard hand may change it; a nominal piece may be cut up to that many mm short.
 */
export function FitFields({
  name,
  fit,
  onChange,
  nominalDefaultMm,
}: {
  name: string;
  fit: Fit;
  onChange: (fit: Fit) => void;
  nominalDefaultMm: number;
}) {
  return (
    <div className="flex items-center gap-2">
      <select
        aria-label={`Exact or nominal, ${name}`}
        className={inputClass}
        value={fit.nominal ? 'nominal' : 'exact'}
        onChange={(e) => {
          const nominal = e.target.value === 'nominal';
          const toleranceText =
            nominal && fit.toleranceText === '' ? String(nominalDefaultMm) : fit.toleranceText;
          onChange({ nominal, toleranceText });
        }}
      >
        <option value="exact">Exact</option>
        <option value="nominal">Nominal</option>
      </select>
      {fit.nominal && (
        <label className="flex items-center gap-1 text-sm whitespace-nowrap">
          up to
          <input
            type="number"
            min={0}
            max={MAX_TOLERANCE_MM}
            aria-label={`Millimetres short allowed, ${name}`}
            className={`${inputClass} w-16 text-right`}
            value={fit.toleranceText}
            onChange={(e) => onChange({ ...fit, toleranceText: e.target.value })}
          />
          mm short
        </label>
      )}
    </div>
  );
}
