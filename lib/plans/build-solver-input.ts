// Turns one section's line items, stock lengths and rack offcuts into the solver's input.
import type { SolveInput } from '@/solver';
import { usableTolerance } from '@/lib/nominal/tolerance';
import { offcutSourceId, pieceIdFor, stockSourceId, type PlanSettings } from './plan-shapes';

/** toleranceMm: how far short a nominal piece may be cut (0 or absent: exact). */
export type PlanningItem = { id: number; lengthMm: number; quantity: number; toleranceMm?: number };
export type PlanningStock = {
  id: number;
  lengthMm: number;
  pricePence: number;
  onHand: number | null;
  active: boolean;
};
export type PlanningOffcut = { id: number; lengthMm: number };

export function buildSolverInput({
  items,
  stock,
  offcuts,
  settings,
}: {
  items: PlanningItem[];
  stock: PlanningStock[];
  offcuts: PlanningOffcut[];
  settings: PlanSettings;
}): SolveInput {
  const allowed = settings.stockLengthIds ? new Set(settings.stockLengthIds) : null;
  return {
    kerf: settings.kerfMm,
    trim: settings.trimMm,
    minOffcut: settings.minOffcutMm,
    timeLimitMs: settings.timeLimitMs,
    stock: stock
      .filter((s) => s.active && (!allowed || allowed.has(s.id)))
      .map((s) => ({
        id: stockSourceId(s.id),
        length: s.lengthMm,
        cost: s.pricePence / 100,
        // Plans stay within what is on hand (null: the yard treats the length as always available).
        available: s.onHand === null ? null : Math.max(0, s.onHand),
      })),
    offcuts: settings.useOffcuts
      ? offcuts.map((o) => ({ id: offcutSourceId(o.id), length: o.lengthMm }))
      : [],
    pieces: items
      .filter((i) => i.quantity > 0)
      .map((i) => ({
        id: pieceIdFor(i.id),
        length: i.lengthMm,
        quantity: i.quantity,
        tolerance: usableTolerance(i.toleranceMm ?? 0, i.lengthMm),
      })),
  };
}
