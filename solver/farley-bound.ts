// A valid lower bound from any master-LP duals, available at every pricing round (A. A. Farley,
// "A note on bounding a class of linear programming problems, including cutting stock problems",
// Operations Research 38(5), 1990; the Lagrangian bound of column generation). Scaling the piece
// duals by t makes them feasible for every pattern, so t·Σ y_i·d_i + Σ y_j·limit_j bounds the LP.
// Column generation can stop as soon as this bound rounds to the same board count as the master.

export interface FarleyInput {
  /** Dual of each item row (≥ demand); negatives are clamped to 0. */
  itemDuals: number[];
  demands: number[];
  /** Per board kind: cost, best pattern value under the clamped duals, dual of its limit row (0 if none), limit. */
  kinds: { cost: number; bestValue: number; limitDual: number; limit: number }[];
}

export function farleyBound(input: FarleyInput): number {
  let t = Infinity;
  let limitPart = 0;
  for (const k of input.kinds) {
    if (k.limit <= 0) continue;
    // Limit rows are ≤ rows: a valid dual is ≤ 0.
    const yj = Math.min(0, k.limitDual);
    if (Number.isFinite(k.limit)) limitPart += yj * k.limit;
    if (k.bestValue > 0) t = Math.min(t, (k.cost - yj) / k.bestValue);
  }
  if (!Number.isFinite(t)) return -Infinity;
  let itemPart = 0;
  input.itemDuals.forEach((y, i) => (itemPart += Math.max(0, y) * input.demands[i]));
  return t * itemPart + limitPart;
}
