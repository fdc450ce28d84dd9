// The integer step: choose how many boards to cut to each known pattern with HiGHS, over the
// patterns of the heuristic plans, the pattern LP's columns and simple greedy patterns per board
// kind (price-and-branch). Phase 1 minimises cost in whole money units; phase 2 keeps that cost
// and prefers less scrap, rack offcuts before new stock and fewer kept remainders. A pattern pool
// is not every pattern, so this proves nothing by itself: the plan is proven only when it meets
// the LP or length bound. Every plan it returns is checked with the engine's own fit rules first.

import { boardFits } from './board-fit';
import type { Pattern } from './column-generation';
import { highsEngine, runUntil } from './highs-engine';
import type { Model } from './model';
import { boardScrap, isKept, makeBoard, remainderOf, type PackedBoard, type Packing } from './packing';
import type { SearchBudget } from './search-budget';
import { costStep } from './money';

/** Patterns above this many are not handed to HiGHS (memory and time on 2 cores). */
const MAX_PATTERNS = 20_000;

interface Column {
  bin: number;
  items: number[];
}

export function exactStep(
  model: Model,
  demand: number[],
  limits: number[],
  plans: Packing[],
  lpPool: Pattern[],
  budget: SearchBudget,
  /** A cost already proven cheapest: only phase 2 (tidying among plans of this cost) runs. */
  provenCost: number | null = null,
): Packing | null {
  const highs = highsEngine();
  if (!highs || demand.every((d) => d === 0)) return null;
  const columns = collectColumns(model, demand, limits, plans, lpPool);
  if (columns.length === 0 || columns.length > MAX_PATTERNS) return null;
  const step = costStep(model.bins.map((b) => b.costUnits));

  const solveWith = (objective: number[], costCap: number | null): number[] | null => {
    // Each phase gets a share of what is left; a callback stops HiGHS at the end of that share.
    const seconds = (budget.remainingMs() * (costCap === null ? 0.4 : 0.5)) / 1000;
    if (seconds < 0.02) return null;
    const text = writeModel(model, demand, limits, columns, objective, costCap);
    const mip = highs.createModel();
    try {
      mip.readModel({ format: 'lp', data: text });
      mip.options.set({
        time_limit: seconds,
        mip_rel_gap: 0,
        // Costs are multiples of `step`: closing the gap to below one step proves phase 1.
        mip_abs_gap: costCap === null ? Math.max(0.5, step - 0.5) : 0.5,
        // Presolve off: faster on these small pattern models here, and clear of a known presolve fault.
        presolve: 'off',
        output_flag: false,
        random_seed: 0,
      });
      runUntil(highs, mip, performance.now() + seconds * 1000);
      if (Number(mip.info.get('primal_solution_status')) !== 2) return null;
      const values = mip.getSolution().colValue;
      const x = columns.map(() => 0);
      for (let k = 0; k < values.length; k++) {
        const c = Number(mip.getColName(k).slice(1));
        if (c < x.length) x[c] = Math.round(values[k]);
      }
      return x.every((v) => Number.isFinite(v) && v >= 0) ? x : null;
    } catch {
      return null;
    } finally {
      mip.dispose();
    }
  };

  const costs = columns.map((c) => model.bins[c.bin].costUnits);
  let packing: Packing | null = null;
  let cost = provenCost ?? 0;
  if (provenCost === null) {
    const first = solveWith(costs, null);
    if (!first) return null;
    packing = toPacking(model, columns, first, demand);
    if (!isValid(model, packing, demand, limits)) return null;
    cost = first.reduce((s, x, c) => s + x * costs[c], 0);
  }
  // Among plans of this cost: less scrap, then offcuts before new stock, then fewer kept remainders.
  const prefer = columns.map((c) => {
    const board = makeBoard(model, c.bin, c.items);
    const stock = model.bins[c.bin].source === 'stock' ? 1 : 0;
    return boardScrap(model, board) + 50 * stock + (isKept(model, remainderOf(model, board)) ? 20 : 0);
  });
  const second = budget.remainingMs() > 150 ? solveWith(prefer, cost) : null;
  if (second) {
    const tidy = toPacking(model, columns, second, demand);
    const tidyCost = tidy.boards.reduce((s, b) => s + model.bins[b.bin].costUnits, 0);
    if (tidyCost <= cost && isValid(model, tidy, demand, limits)) packing = tidy;
  }
  return packing;
}

function collectColumns(
  model: Model,
  demand: number[],
  limits: number[],
  plans: Packing[],
  lpPool: Pattern[],
): Column[] {
  const seen = new Set<string>();
  const out: Column[] = [];
  const add = (bin: number, items: number[]) => {
    if (items.length === 0 || limits[bin] <= 0) return;
    const sorted = [...items].sort((a, b) => a - b);
    const key = `${bin}:${sorted.join(',')}`;
    if (seen.has(key) || !boardFits(model, bin, sorted)) return;
    seen.add(key);
    out.push({ bin, items: sorted });
  };
  for (const p of plans) for (const b of p.boards) add(b.bin, b.items);
  for (const p of lpPool) {
    const items: number[] = [];
    p.counts.forEach((n, i) => {
      for (let k = 0; k < Math.min(n, demand[i]); k++) items.push(i);
    });
    add(p.bin, items);
  }
  // Greedy patterns: as many of one length as fit, then the longest others that still fit.
  model.bins.forEach((_, j) => {
    model.items.forEach((_, i) => {
      if (demand[i] === 0) return;
      const items: number[] = [];
      const left = [...demand];
      const tryAdd = (t: number) => {
        if (left[t] <= 0 || !boardFits(model, j, [...items, t])) return false;
        items.push(t);
        left[t]--;
        return true;
      };
      while (tryAdd(i));
      if (items.length === 0) return;
      add(j, items);
      for (let t = 0; t < model.items.length; t++) while (tryAdd(t));
      add(j, items);
    });
  });
  return out;
}

function writeModel(
  model: Model,
  demand: number[],
  limits: number[],
  columns: Column[],
  objective: number[],
  costCap: number | null,
): string {
  const lines: string[] = ['Minimize'];
  lines.push(` obj: ${terms(columns.map((_, c) => [objective[c], c]))}`);
  lines.push('Subject To');
  const perItem: [number, number][][] = demand.map(() => []);
  const perBin: number[][] = model.bins.map(() => []);
  columns.forEach((col, c) => {
    const counts = new Map<number, number>();
    for (const i of col.items) counts.set(i, (counts.get(i) ?? 0) + 1);
    for (const [i, n] of counts) perItem[i].push([n, c]);
    perBin[col.bin].push(c);
  });
  demand.forEach((d, i) => {
    if (d > 0) lines.push(` d${i}: ${terms(perItem[i])} >= ${d}`);
  });
  perBin.forEach((cs, j) => {
    if (cs.length > 0 && Number.isFinite(limits[j]))
      lines.push(` l${j}: ${terms(cs.map((c) => [1, c]))} <= ${limits[j]}`);
  });
  if (costCap !== null) {
    const costTerms = columns.map((col, c) => [model.bins[col.bin].costUnits, c] as [number, number]);
    lines.push(` cost: ${terms(costTerms.filter(([u]) => u > 0))} <= ${costCap}`);
  }
  lines.push('General');
  for (let c = 0; c < columns.length; c += 20)
    lines.push(
      ` ${columns
        .slice(c, c + 20)
        .map((_, k) => `x${c + k}`)
        .join(' ')}`,
    );
  lines.push('End');
  return lines.join('\n');
}

/** "3 x0 + 1 x4 …", wrapped so no line gets very long. */
function terms(list: [number, number][]): string {
  if (list.length === 0) return '0 x0';
  const parts = list.map(([a, c]) => `${a} x${c}`);
  const rows: string[] = [];
  for (let k = 0; k < parts.length; k += 12) rows.push(parts.slice(k, k + 12).join(' + '));
  return rows.join('\n + ');
}

/** Boards from the chosen patterns; pieces covered twice are left off the last boards that hold them. */
function toPacking(model: Model, columns: Column[], x: number[], demand: number[]): Packing {
  const boards: PackedBoard[] = [];
  columns.forEach((col, c) => {
    for (let k = 0; k < x[c]; k++) boards.push({ bin: col.bin, items: [...col.items], load: 0 });
  });
  const surplus = [...demand];
  for (const b of boards) for (const i of b.items) surplus[i]--;
  for (let k = boards.length - 1; k >= 0; k--) {
    boards[k].items = boards[k].items.filter((i) => {
      if (surplus[i] < 0) {
        surplus[i]++;
        return false;
      }
      return true;
    });
  }
  return {
    boards: boards.filter((b) => b.items.length > 0).map((b) => makeBoard(model, b.bin, b.items)),
    unplaced: model.items.map(() => 0),
  };
}

/** Never trust the integer solver unchecked: every board fits, every piece once, caps kept. */
export function isValid(model: Model, p: Packing, demand: number[], limits: number[]): boolean {
  const placed = demand.map(() => 0);
  const used = limits.map(() => 0);
  for (const b of p.boards) {
    if (!boardFits(model, b.bin, b.items)) return false;
    used[b.bin]++;
    for (const i of b.items) placed[i]++;
  }
  return placed.every((n, i) => n + p.unplaced[i] === demand[i]) && used.every((n, j) => n <= limits[j]);
}
