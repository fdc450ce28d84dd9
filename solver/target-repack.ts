// Local search towards a target board count (one board kind). Keep `target` boards and put the
// pieces of the others in a pool; then, over and over, refill one board or a pair of boards from
// their own pieces plus the pool by subset-sum (fullest board first, big pieces preferred), taking a
// change only when it strictly improves (total load in boards, Σ load², Σ piece²) — so the walk
// ends, and it never depends on the clock. Success is an empty pool.
// In the spirit of the pool-based searches for bin packing (e.g. M. Buljubašić, M. Vasquez,
// "Consistent neighborhood search for one-dimensional bin packing", Computers & OR 76, 2016).

export interface RepackCaps {
  maxRounds: number;
  /** Different choices of which boards to empty into the pool at the start. */
  starts: number;
}

interface State {
  bins: number[][];
  loads: number[];
  pool: number[];
}

export function repackToTarget(
  pieceWeights: number[],
  capacity: number,
  target: number,
  initial: number[][],
  caps: RepackCaps,
  shouldStop: () => boolean,
): number[][] | null {
  const load = (xs: number[]) => xs.reduce((s, p) => s + pieceWeights[p], 0);
  const sq = (xs: number[]) => xs.reduce((s, p) => s + pieceWeights[p] * pieceWeights[p], 0);
  const order = initial.map((b, k) => k).sort((a, b) => load(initial[b]) - load(initial[a]) || a - b);
  for (let start = 0; start < caps.starts; start++) {
    if (shouldStop()) return null;
    // Start s empties the (s)-th choice: the emptiest boards, shifted by s through the ranking.
    const drop = new Set<number>();
    for (let k = 0; drop.size < initial.length - target && k < order.length; k++) {
      drop.add(order[(order.length - 1 - k - start + order.length * 4) % order.length]);
    }
    const state: State = { bins: [], loads: [], pool: [] };
    initial.forEach((b, k) => {
      if (drop.has(k)) state.pool.push(...b);
      else {
        state.bins.push([...b]);
        state.loads.push(load(b));
      }
    });
    if (improve(state)) return state.bins;
  }
  return null;

  function improve(state: State): boolean {
    for (let round = 0; round < caps.maxRounds; round++) {
      if (state.pool.length === 0) return true;
      if (shouldStop()) return false;
      let changed = false;
      for (let b = 0; b < state.bins.length; b++) {
        if (refill(state, [b])) changed = true;
        if (state.pool.length === 0) return true;
      }
      if (changed) continue;
      for (let a = 0; a < state.bins.length && !changed; a++) {
        if (shouldStop()) return false;
        for (let b = a + 1; b < state.bins.length && !changed; b++) {
          if (refill(state, [a, b])) changed = true;
        }
      }
      if (!changed) return false;
    }
    return state.pool.length === 0;
  }

  /** Refills the given boards in turn from their pieces plus the pool; keeps the result if strictly better. */
  function refill(state: State, which: number[]): boolean {
    const candidates = [...state.pool];
    for (const b of which) candidates.push(...state.bins[b]);
    const before = which.reduce((s, b) => s + state.loads[b], 0);
    const beforeSq = which.reduce((s, b) => s + state.loads[b] * state.loads[b], 0);
    const beforeItemsSq = which.reduce((s, b) => s + sq(state.bins[b]), 0);
    let rest = candidates;
    const chosen: number[][] = [];
    for (let k = 0; k < which.length; k++) {
      const pickIdx = bestFill(rest);
      const set = new Set(pickIdx);
      chosen.push(pickIdx.map((i) => rest[i]));
      rest = rest.filter((_, i) => !set.has(i));
    }
    const loads = chosen.map(load);
    const after = loads.reduce((s, l) => s + l, 0);
    const afterSq = loads.reduce((s, l) => s + l * l, 0);
    const afterItemsSq = chosen.reduce((s, c) => s + sq(c), 0);
    const better =
      after > before ||
      (after === before && (afterSq > beforeSq || (afterSq === beforeSq && afterItemsSq > beforeItemsSq)));
    if (!better) return false;
    which.forEach((b, k) => {
      state.bins[b] = chosen[k];
      state.loads[b] = loads[k];
    });
    state.pool = rest;
    return true;
  }

  /** Indexes into `items` of the fullest subset within capacity, most Σ piece² on ties. */
  function bestFill(items: number[]): number[] {
    const C = capacity;
    const value = new Float64Array(C + 1).fill(-1);
    value[0] = 0;
    const take = new Uint8Array(items.length * (C + 1));
    items.forEach((p, i) => {
      const w = pieceWeights[p];
      const v = w * w;
      for (let c = C; c >= w; c--) {
        if (value[c - w] >= 0 && value[c - w] + v > value[c]) {
          value[c] = value[c - w] + v;
          take[i * (C + 1) + c] = 1;
        }
      }
    });
    let c = C;
    while (value[c] < 0) c--;
    const out: number[] = [];
    for (let i = items.length - 1; i >= 0 && c > 0; i--) {
      if (take[i * (C + 1) + c]) {
        out.push(i);
        c -= pieceWeights[items[i]];
      }
    }
    return out;
  }
}
