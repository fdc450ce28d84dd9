// The Gilmore–Gomory pattern LP, solved by column generation with a small revised simplex.
//   min Σ cost(p)·x_p  s.t.  Σ a_ip·x_p ≥ demand_i,  Σ_{p on board kind j} x_p ≤ limit_j,  x ≥ 0.
// Rows start covered by artificial columns with a big cost, so the first basis is the identity.

import { ColumnStore } from './column-store';
import { DenseBasis } from './dense-basis';
import { farleyBound } from './farley-bound';
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

const EPS = 1e-9;
/** Weight of the best Farley point in the pricing duals. */
const SMOOTHING = 0.8;

export function patternKey(p: Pattern): string {
  return `${p.bin}:${p.counts.join(',')}`;
}

export function solvePatternLp(
  items: LpItem[],
  bins: LpBin[],
  opts: {
    maxPivots: number;
    pool?: Pattern[];
    shouldStop?: () => boolean;
    /** Cost of a known plan: stop once the bound proves it optimal. */
    stopAtCost?: number;
  },
): LpResult {
  const rowOfItem: number[] = [];
  let m = 0;
  for (const it of items) rowOfItem.push(it.demand > 0 ? m++ : -1);
  const itemRows = m;
  const rowOfBin: number[] = [];
  for (const b of bins) rowOfBin.push(Number.isFinite(b.limit) ? m++ : -1);
  const empty: LpResult = {
    value: 0,
    converged: true,
    feasible: true,
    solution: [],
    pool: opts.pool ?? [],
    pivots: 0,
  };
  if (itemRows === 0) return empty;

  const seenStart = new Set<string>();
  const maxCost = bins.reduce((s, b) => Math.max(s, b.cost), 0);
  const bigM = 2 * Math.max(1, maxCost) + 1;
  const columns = new ColumnStore<Pattern>();
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
      columns.add([rowOfItem[i]], [bestCopies], bins[bestBin].cost, pattern);
    } else {
      columns.add([rowOfItem[i]], [1], bigM, undefined, true);
    }
  });
  bins.forEach((b, j) => {
    if (rowOfBin[j] >= 0) {
      rhs[rowOfBin[j]] = b.limit;
      columns.add([rowOfBin[j]], [1], 0);
    }
  });
  const basis = Array.from({ length: columns.count }, (_, k) => k);
  items.forEach((_, i) => {
    if (rowOfItem[i] >= 0) columns.add([rowOfItem[i]], [-1], 0);
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
    return columns.add(rows, vals, bins[p.bin].cost, p);
  };
  for (const p of opts.pool ?? []) addPattern(p);

  let basisPos = new Int32Array(columns.count + 1024).fill(-1);
  basis.forEach((c, k) => (basisPos[c] = k));
  // A tiny fixed perturbation of the right-hand side keeps the simplex from stalling on these
  // highly degenerate LPs; the reported value is the dual objective on the true data, so it stays a bound.
  const trueRhs = Float64Array.from(rhs);
  for (let r = 0; r < m; r++) rhs[r] += 1e-6 * (1 + ((r * 7919) % 997) / 997);
  const lu = new DenseBasis(m);
  basis.forEach((c, k) => (lu.inv[k * m + k] = 1 / columns.vals[columns.start[c]]));
  const xB = Float64Array.from(rhs, (r, k) => r / columns.vals[columns.start[basis[k]]]);
  const costB = new Float64Array(m);
  basis.forEach((c, k) => (costB[k] = columns.cost[c]));
  const y = new Float64Array(m);
  const d = new Float64Array(m);
  const weights = items.map((it) => it.weight);
  const bounds = items.map((it) => it.demand);
  const caps = bins.map((b) => b.capacity);
  const canPrice = pricingCells(weights, bounds, Math.max(...caps)) <= MAX_PRICING_CELLS;

  let pivots = 0;
  let converged = false;
  let farley = -Infinity;
  let settledByBound = false;
  let center: Float64Array | null = null;
  const boundSettles = (): boolean => {
    for (let k = 0; k < m; k++) if (columns.artificial[basis[k]] && xB[k] > 1e-7) return false;
    // Stopping once the bound merely rounds up like the master was tried: it saved few pivots, and
    // rounding a not-yet-optimal LP solution lost boards on Scholl instances.
    return opts.stopAtCost !== undefined && farley >= opts.stopAtCost - 1e-6 * Math.max(1, opts.stopAtCost);
  };
  const refactorEvery = Math.max(500, 10 * m);
  lu.duals(costB, y);
  while (pivots < opts.maxPivots) {
    if (pivots % 64 === 0 && opts.shouldStop?.()) break;
    let enter = -1;
    let best = -EPS;
    const { cost, scale, artificial, start, rows, vals } = columns;
    for (let c = 0, n = columns.count; c < n; c++) {
      if (basisPos[c] >= 0 || artificial[c]) continue;
      let rc = cost[c];
      for (let t = start[c], end = start[c + 1]; t < end; t++) rc -= y[rows[t]] * vals[t];
      if (rc < -EPS && rc * scale[c] < best) {
        best = rc * scale[c];
        enter = c;
      }
    }
    if (enter < 0) {
      if (!canPrice) break;
      // Price at duals smoothed towards the best Farley point first (Wentges 1997); only when
      // that finds nothing for the true duals is the true point priced, and only then can it converge.
      let settled = false;
      for (let attempt = 0; attempt < 2 && enter < 0 && !settled; attempt++) {
        const alpha = attempt === 0 && center ? SMOOTHING : 0;
        if (attempt === 1 && alpha === 0 && !center) break;
        const yp: Float64Array =
          center && alpha > 0
            ? Float64Array.from(y, (v, r) => alpha * (center as Float64Array)[r] + (1 - alpha) * v)
            : y;
        const values = items.map((_, i) => (rowOfItem[i] >= 0 ? yp[rowOfItem[i]] : 0));
        const trueValues = items.map((_, i) => (rowOfItem[i] >= 0 ? y[rowOfItem[i]] : 0));
        const priced = priceBestPatterns(weights, values, bounds, caps);
        const lb = farleyBound({
          itemDuals: values,
          demands: bounds,
          kinds: bins.map((b, j) => ({
            cost: b.cost,
            bestValue: priced[j].value,
            limitDual: rowOfBin[j] >= 0 ? yp[rowOfBin[j]] : 0,
            limit: b.limit,
          })),
        });
        if (lb > farley) {
          farley = lb;
          center = Float64Array.from(yp);
          if (boundSettles()) settled = true;
        }
        if (settled) break;
        priced.forEach((pp, j) => {
          if (bins[j].limit <= 0 || pp.load === 0) return;
          const capDual = rowOfBin[j] >= 0 ? y[rowOfBin[j]] : 0;
          let value = 0;
          pp.counts.forEach((c, i) => (value += c * trueValues[i]));
          const rc = bins[j].cost - value - capDual;
          if (rc < -1e-7) {
            const idx = addPattern({ bin: j, counts: pp.counts, load: pp.load });
            if (idx < 0) return;
            const scaled = rc * columns.scale[idx];
            if (scaled < best) {
              best = scaled;
              enter = idx;
            }
          }
        });
        if (alpha === 0 && enter < 0) converged = true;
      }
      if (settled) {
        converged = settledByBound = true;
        break;
      }
      if (enter < 0) {
        converged = true;
        break;
      }
      if (columns.count > basisPos.length) {
        const grown = new Int32Array(columns.count * 2).fill(-1);
        grown.set(basisPos);
        basisPos = grown;
      }
    }
    lu.solve(columns.column(enter), d);
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
    const rcEnter = columns.reducedCost(enter, y);
    lu.pivot(leave, d);
    // New duals: y + rc_q · (new row `leave` of B⁻¹), an O(m) update instead of O(m²).
    const rowBase = leave * m;
    for (let r = 0; r < m; r++) y[r] += rcEnter * lu.inv[rowBase + r];
    basisPos[basis[leave]] = -1;
    basis[leave] = enter;
    basisPos[enter] = leave;
    costB[leave] = columns.cost[enter];
    pivots++;
    if (pivots % refactorEvery === 0) {
      if (lu.refactor(basis.map((c) => columns.column(c)))) {
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
    const pattern = columns.payload[c];
    if (columns.artificial[c] && x > 1e-7) feasible = false;
    value += columns.cost[c] * x;
    if (pattern && x > 1e-9) solution.push({ pattern, x });
  });
  const pool = columns.payload.filter((p): p is Pattern => p !== undefined);
  // Stopped by the bound, the master's duals are not yet feasible and only Farley's bound is valid.
  const lpValue = settledByBound ? farley : Math.max(farley, Math.min(value, dualValue));
  return { value: converged ? lpValue : value, converged, feasible, solution, pool, pivots };
}
