// The Gilmore–Gomory pattern LP, solved by column generation with a small revised simplex.
//   min Σ cost(p)·x_p  s.t.  Σ a_ip·x_p ≥ demand_i,  Σ_{p on board kind j} x_p ≤ limit_j,  x ≥ 0.
// Rows start covered by artificial columns with a big cost, so the first basis is the identity.

import { DenseBasis, type SparseColumn } from './dense-basis';
import { MAX_PRICING_CELLS, priceBestPatterns, pricingCells } from './pattern-pricing';

export interface LpItem {
  weight: number;
  demand: number;
}

export interface LpBin {
  capacity: number;
  cost: number;
  limit: number;
}

export interface Pattern {
  bin: number;
  counts: number[];
  load: number;
}

export interface LpResult {
  /** Objective value; a valid lower bound only when `converged && feasible`. */
  value: number;
  converged: boolean;
  feasible: boolean;
  /** Pattern columns with their LP values (x > 0 only). */
  solution: { pattern: Pattern; x: number }[];
  /** All pattern columns generated, to warm-start later solves. */
  pool: Pattern[];
  pivots: number;
}

interface Column extends SparseColumn {
  cost: number;
  /** 1/‖a‖: entering by normalised reduced cost takes far fewer degenerate pivots than plain Dantzig. */
  scale?: number;
  pattern?: Pattern;
  artificial?: boolean;
}

const EPS = 1e-9;

export function patternKey(p: Pattern): string {
  return `${p.bin}:${p.counts.join(',')}`;
}

export function solvePatternLp(
  items: LpItem[],
  bins: LpBin[],
  opts: { maxPivots: number; pool?: Pattern[]; shouldStop?: () => boolean },
): LpResult {
  const rowOfItem: number[] = [];
  let m = 0;
  for (const it of items) rowOfItem.push(it.demand > 0 ? m++ : -1);
  const itemRows = m;
  const rowOfBin: number[] = [];
  for (const b of bins) rowOfBin.push(Number.isFinite(b.limit) ? m++ : -1);
  const empty: LpResult = { value: 0, converged: true, feasible: true, solution: [], pool: opts.pool ?? [], pivots: 0 };
  if (itemRows === 0) return empty;

  const seenStart = new Set<string>();
  const maxCost = bins.reduce((s, b) => Math.max(s, b.cost), 0);
  const bigM = 2 * Math.max(1, maxCost) + 1;
  const columns: Column[] = [];
  const rhs = new Float64Array(m);
  // Start from the classic diagonal basis: for each piece length, a board cut to as many of it as fit
  // (on the cheapest unlimited board per piece); an artificial column only where no such board exists.
  items.forEach((it, i) => {
    if (rowOfItem[i] < 0) return;
    rhs[rowOfItem[i]] = it.demand;
    let bestBin = -1;
    let bestCopies = 0;
    bins.forEach((b, j) => {
      if (Number.isFinite(b.limit)) return;
      const copies = Math.min(it.demand, Math.floor(b.capacity / it.weight));
      if (copies > 0 && (bestBin < 0 || b.cost / copies < bins[bestBin].cost / bestCopies)) {
        bestBin = j;
        bestCopies = copies;
      }
    });
    if (bestBin >= 0) {
      const counts = items.map((_, k) => (k === i ? bestCopies : 0));
      const pattern: Pattern = { bin: bestBin, counts, load: bestCopies * it.weight };
      seenStart.add(patternKey(pattern));
      columns.push({ rows: [rowOfItem[i]], vals: [bestCopies], cost: bins[bestBin].cost, pattern });
    } else {
      columns.push({ rows: [rowOfItem[i]], vals: [1], cost: bigM, artificial: true });
    }
  });
  bins.forEach((b, j) => {
    if (rowOfBin[j] >= 0) {
      rhs[rowOfBin[j]] = b.limit;
      columns.push({ rows: [rowOfBin[j]], vals: [1], cost: 0 });
    }
  });
  const basis = columns.map((_, k) => k);
  items.forEach((_, i) => {
    if (rowOfItem[i] >= 0) columns.push({ rows: [rowOfItem[i]], vals: [-1], cost: 0 });
  });
  const seen = seenStart;
  const addPattern = (p: Pattern): number => {
    const key = patternKey(p);
    if (seen.has(key)) return -1;
    if (bins[p.bin].limit <= 0) return -1;
    seen.add(key);
    const rows: number[] = [];
    const vals: number[] = [];
    p.counts.forEach((c, i) => {
      if (c > 0 && rowOfItem[i] >= 0) {
        rows.push(rowOfItem[i]);
        vals.push(c);
      }
    });
    if (rows.length === 0) return -1;
    if (rowOfBin[p.bin] >= 0) {
      rows.push(rowOfBin[p.bin]);
      vals.push(1);
    }
    columns.push({ rows, vals, cost: bins[p.bin].cost, pattern: p });
    return columns.length - 1;
  };
  for (const p of opts.pool ?? []) addPattern(p);

  let basisPos = new Int32Array(columns.length + 1024).fill(-1);
  const isBasic = (c: number) => c < basisPos.length && basisPos[c] >= 0;
  basis.forEach((c, k) => (basisPos[c] = k));
  // A tiny fixed perturbation of the right-hand side keeps the simplex from stalling on these
  // highly degenerate LPs; the reported value is the dual objective on the true data, so it stays a bound.
  const trueRhs = Float64Array.from(rhs);
  for (let r = 0; r < m; r++) rhs[r] += 1e-6 * (1 + ((r * 7919) % 997) / 997);
  const lu = new DenseBasis(m);
  basis.forEach((c, k) => (lu.inv[k * m + k] = 1 / columns[c].vals[0]));
  const xB = Float64Array.from(rhs, (r, k) => r / columns[basis[k]].vals[0]);
  const costB = new Float64Array(m);
  basis.forEach((c, k) => (costB[k] = columns[c].cost));
  const y = new Float64Array(m);
  const d = new Float64Array(m);
  const weights = items.map((it) => it.weight);
  const bounds = items.map((it) => it.demand);
  const caps = bins.map((b) => b.capacity);
  const canPrice = pricingCells(weights, bounds, Math.max(...caps)) <= MAX_PRICING_CELLS;

  let pivots = 0;
  let converged = false;
  const refactorEvery = Math.max(500, 10 * m);
  lu.duals(costB, y);
  while (pivots < opts.maxPivots) {
    if (pivots % 64 === 0 && opts.shouldStop?.()) break;
    let enter = -1;
    let best = -EPS;
    for (let c = 0; c < columns.length; c++) {
      if (isBasic(c) || columns[c].artificial) continue;
      const col = columns[c];
      let rc = col.cost;
      for (let t = 0; t < col.rows.length; t++) rc -= y[col.rows[t]] * col.vals[t];
      const scale = col.scale ?? (col.scale = 1 / Math.sqrt(col.vals.reduce((a, v) => a + v * v, 0)));
      if (rc < -EPS && rc * scale < best) {
        best = rc * scale;
        enter = c;
      }
    }
    if (enter < 0) {
      if (!canPrice) break;
      const values = items.map((_, i) => (rowOfItem[i] >= 0 ? y[rowOfItem[i]] : 0));
      const priced = priceBestPatterns(weights, values, bounds, caps);
      priced.forEach((pp, j) => {
        if (bins[j].limit <= 0 || pp.load === 0) return;
        const capDual = rowOfBin[j] >= 0 ? y[rowOfBin[j]] : 0;
        const rc = bins[j].cost - pp.value - capDual;
        if (rc < -1e-7) {
          const idx = addPattern({ bin: j, counts: pp.counts, load: pp.load });
          if (idx < 0) return;
          const col = columns[idx];
          const scaled = rc / Math.sqrt(col.vals.reduce((a, v) => a + v * v, 0));
          if (scaled < best) {
            best = scaled;
            enter = idx;
          }
        }
      });
      if (enter < 0) {
        converged = true;
        break;
      }
      if (columns.length > basisPos.length) {
        const grown = new Int32Array(columns.length * 2).fill(-1);
        grown.set(basisPos);
        basisPos = grown;
      }
    }
    lu.solve(columns[enter], d);
    let leave = -1;
    let ratio = Infinity;
    for (let k = 0; k < m; k++) {
      if (d[k] > EPS) {
        const r = xB[k] / d[k];
        if (r < ratio - 1e-12 || (r <= ratio + 1e-12 && leave >= 0 && d[k] > d[leave])) {
          ratio = r;
          leave = k;
        }
      }
    }
    if (leave < 0) break; // unbounded cannot happen with non-negative costs; stop defensively
    for (let k = 0; k < m; k++) xB[k] -= ratio * d[k];
    xB[leave] = ratio;
    const entering = columns[enter];
    let rcEnter = entering.cost;
    for (let t = 0; t < entering.rows.length; t++) rcEnter -= y[entering.rows[t]] * entering.vals[t];
    lu.pivot(leave, d);
    // New duals: y + rc_q · (new row `leave` of B⁻¹), an O(m) update instead of O(m²).
    const rowBase = leave * m;
    for (let r = 0; r < m; r++) y[r] += rcEnter * lu.inv[rowBase + r];
    basisPos[basis[leave]] = -1;
    basis[leave] = enter;
    basisPos[enter] = leave;
    costB[leave] = columns[enter].cost;
    pivots++;
    if (pivots % refactorEvery === 0) {
      if (lu.refactor(basis.map((c) => columns[c]))) {
        xB.fill(0);
        for (let k = 0; k < m; k++) for (let r = 0; r < m; r++) xB[k] += lu.inv[k * m + r] * rhs[r];
      }
      lu.duals(costB, y);
    }
  }
  let value = 0;
  let feasible = true;
  lu.duals(costB, y);
  let dualValue = 0;
  for (let r = 0; r < m; r++) dualValue += y[r] * trueRhs[r];
  const solution: { pattern: Pattern; x: number }[] = [];
  basis.forEach((c, k) => {
    const x = Math.max(0, xB[k]);
    const col = columns[c];
    if (col.artificial && x > 1e-7) feasible = false;
    value += col.cost * x;
    if (col.pattern && x > 1e-9) solution.push({ pattern: col.pattern, x });
  });
  const pool = columns.filter((c) => c.pattern).map((c) => c.pattern as Pattern);
  return { value: converged ? Math.min(value, dualValue) : value, converged, feasible, solution, pool, pivots };
}
