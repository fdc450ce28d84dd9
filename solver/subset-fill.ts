// Subset-sum over the pieces still to cut: which total lengths can be made exactly, and from what.
// Used to fill a board as full as possible (minimum slack) around its longest piece.

export interface SubsetTable {
  maxSum: number;
  /** from[s] = 1 + index of the part that first made sum s; 0 = unreachable; from[0] = -1. */
  from: Int32Array;
  partItem: number[];
  partMult: number[];
  /** best[s] = largest reachable sum ≤ s. */
  best: Int32Array;
}

/** Items in `counts` are item-type indexes into `weights`; larger pieces are tried first. */
export function buildSubsetTable(weights: number[], counts: number[], maxSum: number): SubsetTable {
  const partItem: number[] = [];
  const partMult: number[] = [];
  for (let i = 0; i < weights.length; i++) {
    let b = Math.min(counts[i], Math.floor(maxSum / weights[i]));
    for (let k = 1; b > 0; k *= 2) {
      const take = Math.min(k, b);
      partItem.push(i);
      partMult.push(take);
      b -= take;
    }
  }
  const from = new Int32Array(maxSum + 1);
  from[0] = -1;
  let top = 0;
  for (let k = 0; k < partItem.length; k++) {
    const w = weights[partItem[k]] * partMult[k];
    const hi = Math.min(maxSum, top + w);
    for (let s = hi; s >= w; s--) {
      if (from[s] === 0 && from[s - w] !== 0) from[s] = k + 1;
    }
    top = hi;
  }
  const best = new Int32Array(maxSum + 1);
  let last = 0;
  for (let s = 0; s <= maxSum; s++) {
    if (from[s] !== 0) last = s;
    best[s] = last;
  }
  return { maxSum, from, partItem, partMult, best };
}

/** Item-type counts that make exactly `sum` (which must be reachable). */
export function recoverSubset(table: SubsetTable, weights: number[], sum: number, nTypes: number): number[] {
  const counts = new Array<number>(nTypes).fill(0);
  let s = sum;
  while (s > 0) {
    const k = table.from[s] - 1;
    const i = table.partItem[k];
    counts[i] += table.partMult[k];
    s -= weights[i] * table.partMult[k];
  }
  return counts;
}
