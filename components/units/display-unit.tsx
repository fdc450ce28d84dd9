'use client';

import { createContext, useCallback, useContext, useMemo, useSyncExternalStore } from 'react';
import type { DisplayUnit } from '@/db/enums';
import { formatLength } from '@/lib/units/format-length';

// The yard setting decides how lengths are shown; a person may switch for themselves (kept in localStorage).
const STORAGE_KEY = 'kerfwise-display-unit';
const listeners = new Set<() => void>();

function readChoice(): DisplayUnit | null {
  const value = window.localStorage.getItem(STORAGE_KEY);
  return value === 'mm' || value === 'imperial' ? value : null;
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  window.addEventListener('storage', listener);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', listener);
  };
}

type UnitContext = {
  unit: DisplayUnit;
  setUnit: (unit: DisplayUnit) => void;
  format: (mm: number) => string;
  suffix: string;
};
const Context = createContext<UnitContext | null>(null);

export function DisplayUnitProvider({
  yardUnit,
  children,
}: {
  yardUnit: DisplayUnit;
  children: React.ReactNode;
}) {
  const choice = useSyncExternalStore(subscribe, readChoice, () => null);
  const unit = choice ?? yardUnit;
  const setUnit = useCallback((next: DisplayUnit) => {
    window.localStorage.setItem(STORAGE_KEY, next);
    listeners.forEach((l) => l());
  }, []);
  const value = useMemo(
    () => ({
      unit,
      setUnit,
      format: (mm: number) => formatLength(mm, unit),
      suffix: unit === 'mm' ? ' mm' : '',
    }),
    [unit, setUnit],
  );
  return <Context.Provider value={value}>{children}</Context.Provider>;
}

/** Lengths as this person reads them; falls back to millimetres outside a provider. */
export function useDisplayUnit(): UnitContext {
  return (
    useContext(Context) ?? {
      unit: 'mm',
      setUnit: () => {},
      format: (mm) => formatLength(mm, 'mm'),
      suffix: ' mm',
    }
  );
}

/** "2400 mm" or "7′-10 1/2″". */
export function useFormatLength() {
  const { unit } = useDisplayUnit();
  return (mm: number) => formatLength(mm, unit, { withUnit: true });
}
