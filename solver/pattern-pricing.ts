// Pricing for column generation: a bounded knapsack solved by dynamic programming over
// millimetres (each item count split into powers of two, then 0/1 items). One table answers
// every board capacity at once, because f[c] is the best value within capacity c.

export interface PricedPattern {
  value: number;
  counts: number[];
  load: number;
}

/** Above this many table cells the DP would cost too much memory; callers fall back to simpler bounds. */
export const MAX_PRICING_CELLS = 40_000_000;

export function pricingCells(weights: number[], bounds: number[], maxCapacity: number): number {
  let parts = 0;
  for (let i = 0; i < weights.length; i++) {
    const b = Math.min(bounds[i], Math.floor(maxCapacity / weights[i]));
    parts += b > 0 ? Math.ceil(Math.log2(b + 1)) : 0;
  }
  return parts * (maxCapacity + 1);
}

export function priceBestPatterns(
  weights: number[],
  values: number[],
  bounds: number[],
  capacities: number[],
): PricedPattern[] {
  const maxCap = capacities.reduce((m, c) => Math.max(m, c), 0);
  const partItem: number[] = [];
  const partMult: number[] = [];
  // partMult 0 marks an item whose bound never binds: one unbounded pass instead of log(b) parts.
  for (let i = 0; i < weights.length; i++) {
    if (!(values[i] > 1e-12)) continue;
    const fit = Math.floor(maxCap / weights[i]);
    if (fit > 1 && bounds[i] >= fit) {
      partItem.push(i);
      partMult.push(0);
      continue;
    }
    let b = Math.min(bounds[i], fit);
    for (let k = 1; b > 0; k *= 2) {
      const take = Math.min(k, b);
      partItem.push(i);
      partMult.push(take);
      b -= take;
    }
  }
  const width = maxCap + 1;
  const f = new Float64Array(width);
  const keep = new Uint8Array(partItem.length * width);
  for (let k = 0; k < partItem.length; k++) {
    const base = k * width;
    if (partMult[k] === 0) {
      const w = weights[partItem[k]];
      const v = values[partItem[k]];
      for (let c = w; c <= maxCap; c++) {
        const cand = f[c - w] + v;
        if (cand > f[c] + 1e-12) {
          f[c] = cand;
          keep[base + c] = 1;
        }
      }
      continue;
    }
    const w = weights[partItem[k]] * partMult[k];
    const v = values[partItem[k]] * partMult[k];
    for (let c = maxCap; c >= w; c--) {
      const cand = f[c - w] + v;
      if (cand > f[c] + 1e-12) {
        f[c] = cand;
        keep[base + c] = 1;
      }
    }
  }
  return capacities.map((cap) => {
    const counts = new Array<number>(weights.length).fill(0);
    let c = cap;
    let load = 0;
    for (let k = partItem.length - 1; k >= 0; k--) {
      if (partMult[k] === 0) {
        const w = weights[partItem[k]];
        while (keep[k * width + c]) {
          counts[partItem[k]]++;
          load += w;
          c -= w;
        }
        continue;
      }
      if (keep[k * width + c]) {
        const w = weights[partItem[k]] * partMult[k];
        counts[partItem[k]] += partMult[k];
        load += w;
        c -= w;
      }
    }
    return { value: f[cap], counts, load };
  });
}
