// The complete integer step: the arc-flow model (J. M. Valério de Carvalho, "Exact solution of
// bin-packing problems using column generation and branch-and-bound", Annals of OR 86, 1999) over
// every board kind at once, solved by HiGHS. A board is a path of piece arcs from where its kind
// starts to the one shared end (a loss arc skips the rest), in the compressed graph of
// arc-flow-graph.ts, so every pattern is in the model and HiGHS's optimum is the job's cheapest
// cost, not just the cheapest over a pool. Boards of only nominal pieces may be
// untrimmed: they get a second graph with the untrimmed capacities; a piece sold full length is a
// column of its own. The heuristics' best plan is handed over as the starting solution, and a
// callback stops HiGHS at our own deadline, because its own clock is checked too rarely here.

import { buildArcFlowGraph, boardPath, type ArcFlowGraph } from './arc-flow-graph';
import { boardFits, isFullLength, isOpenBoard } from './board-fit';
import { highsEngine, runUntil } from './highs-engine';
import type { Model } from './model';
import { costStep } from './money';
import { makeBoard, type PackedBoard, type Packing } from './packing';

/**
 * Graphs above this many arcs (after compression) are not built. Yard jobs stay far below (under 800
 * arcs in the bench); Hard28 (27 000–47 000) is out of reach for HiGHS in WebAssembly within 10 s. At
 * 20 000 the model also ran at the end of Falkenauer t120 instances (4 500–5 300 arcs) and the set lost
 * 2–4 of 20 in back-to-back runs against 5 000 (15–17 against 18–19 at a load of 11–13).
 */
const MAX_ARCS = 5_000;

export interface ArcFlowResult {
  /** Cheapest plan HiGHS found (checked with the engine's own fit rules), or null. */
  packing: Packing | null;
  /** Lower bound on the cost in money units, already rounded up to a cost a plan can have. */
  boundUnits: number;
  /** True when HiGHS closed the gap: `packing` is the cheapest plan there is. */
  proven: boolean;
}

/** Columns of the model, in order: each graph's arcs then its returns, then full-length boards. */
interface Layout {
  graphs: { graph: ArcFlowGraph; arcStart: number; returnStart: number }[];
  full: { item: number; bin: number; col: number }[];
  numCols: number;
}

export function arcFlowStep(
  model: Model,
  demand: number[],
  limits: number[],
  incumbent: Packing,
  timeMs: number,
): ArcFlowResult | null {
  const highs = highsEngine();
  if (!highs || timeMs < 20 || demand.every((d) => d === 0)) return null;
  const deadline = performance.now() + timeMs;
  const open = model.bins.map((b) => b.source === 'stock' && b.openCapacity > b.capacity);
  const trimmed = buildArcFlowGraph(
    model,
    demand,
    () => true,
    model.bins.flatMap((b, j) => (limits[j] > 0 && b.capacity > 0 ? [{ bin: j, cap: b.capacity }] : [])),
    MAX_ARCS,
  );
  if (!trimmed) return null;
  const graphs = [trimmed];
  const nominal = model.items.some((it, i) => it.tolerance > 0 && demand[i] > 0);
  if (nominal && open.some((o, j) => o && limits[j] > 0)) {
    const untrimmed = buildArcFlowGraph(
      model,
      demand,
      (i) => model.items[i].tolerance > 0,
      model.bins.flatMap((b, j) => (open[j] && limits[j] > 0 ? [{ bin: j, cap: b.openCapacity }] : [])),
      MAX_ARCS,
    );
    if (!untrimmed) return null;
    graphs.push(untrimmed);
  }
  const layout: Layout = { graphs: [], full: [], numCols: 0 };
  for (const graph of graphs) {
    const arcStart = layout.numCols;
    const returnStart = arcStart + graph.arcFrom.length;
    layout.graphs.push({ graph, arcStart, returnStart });
    layout.numCols = returnStart + graph.entries.length;
  }
  model.items.forEach((it, i) => {
    if (demand[i] === 0) return;
    model.bins.forEach((b, j) => {
      if (b.source !== 'stock' || limits[j] <= 0 || !isFullLength(model, b, [i])) return;
      if (!boardFits(model, j, [i])) return;
      layout.full.push({ item: i, bin: j, col: layout.numCols++ });
    });
  });

  const step = costStep(model.bins.map((b) => b.costUnits));
  const data = writeModel(model, demand, limits, layout, step);
  const start = startingSolution(model, incumbent, layout);

  const mip = highs.createModel();
  try {
    mip.passModel({ ...data, integrality: new Int32Array(layout.numCols).fill(1) });
    mip.options.set({
      output_flag: false,
      mip_rel_gap: 0,
      // Costs are whole multiples of one price step here, so a gap below one step is a proof.
      mip_abs_gap: 0.9,
      random_seed: 0,
      time_limit: Math.max(0.05, (deadline - performance.now()) / 1000),
    });
    if (start) mip.setSolution({ colValue: start });
    runUntil(highs, mip, deadline);
    const status = mip.getModelStatus();
    const dual = Number(mip.info.get('mip_dual_bound'));
    const proven = status === highs.constants.modelStatus.optimal;
    const boundUnits = Number.isFinite(dual) ? Math.max(0, Math.ceil(dual - 1e-6)) * step : 0;
    const primal = Number(mip.info.get('primal_solution_status'));
    let packing: Packing | null = null;
    if (primal === 2) {
      const x = Array.from(mip.getSolution().colValue, (v) => Math.round(v));
      packing = decompose(model, demand, layout, x);
    }
    return { packing, boundUnits, proven: proven && packing !== null };
  } catch {
    return null;
  } finally {
    mip.dispose();
  }
}

function writeModel(model: Model, demand: number[], limits: number[], layout: Layout, step: number) {
  // Rows: flow conservation per node of each graph, then demand per item, then caps per board kind.
  const rowStart: number[] = [];
  let numRows = 0;
  for (const { graph } of layout.graphs) {
    rowStart.push(numRows);
    numRows += graph.labels.length;
  }
  const demandRow = demand.map((d) => (d > 0 ? numRows++ : -1));
  const limitRow = limits.map((l) => (Number.isFinite(l) ? numRows++ : -1));
  const colCost = new Float64Array(layout.numCols);
  const colUpper = new Float64Array(layout.numCols).fill(Infinity);
  const cols: [number, number][][] = Array.from({ length: layout.numCols }, () => []);
  layout.graphs.forEach(({ graph, arcStart, returnStart }, g) => {
    const r0 = rowStart[g];
    graph.arcFrom.forEach((from, a) => {
      const c = arcStart + a;
      cols[c].push([r0 + from, -1], [r0 + graph.arcTo[a], 1]);
      const item = graph.arcItem[a];
      if (item >= 0) {
        cols[c].push([demandRow[item], 1]);
        colUpper[c] = demand[item];
      }
    });
    graph.entries.forEach((ret, k) => {
      const c = returnStart + k;
      // A board of this kind: one unit of flow from the shared end back to where the kind starts.
      cols[c].push([r0 + graph.end, -1], [r0 + ret.node, 1]);
      if (limitRow[ret.bin] >= 0) cols[c].push([limitRow[ret.bin], 1]);
      colCost[c] = model.bins[ret.bin].costUnits / step;
      colUpper[c] = limits[ret.bin];
    });
  });
  for (const f of layout.full) {
    cols[f.col].push([demandRow[f.item], 1]);
    if (limitRow[f.bin] >= 0) cols[f.col].push([limitRow[f.bin], 1]);
    colCost[f.col] = model.bins[f.bin].costUnits / step;
    colUpper[f.col] = Math.min(demand[f.item], limits[f.bin]);
  }
  const starts = new Int32Array(layout.numCols + 1);
  let nnz = 0;
  for (let c = 0; c < layout.numCols; c++) {
    cols[c].sort((a, b) => a[0] - b[0]);
    nnz += cols[c].length;
    starts[c + 1] = nnz;
  }
  const indices = new Int32Array(nnz);
  const values = new Float64Array(nnz);
  let k = 0;
  for (const col of cols)
    for (const [r, v] of col) {
      indices[k] = r;
      values[k++] = v;
    }
  const rowLower = new Float64Array(numRows);
  const rowUpper = new Float64Array(numRows);
  demand.forEach((d, i) => {
    if (demandRow[i] < 0) return;
    rowLower[demandRow[i]] = d;
    rowUpper[demandRow[i]] = Infinity;
  });
  limits.forEach((l, j) => {
    if (limitRow[j] < 0) return;
    rowLower[limitRow[j]] = -Infinity;
    rowUpper[limitRow[j]] = l;
  });
  return {
    numCols: layout.numCols,
    numRows,
    colCost,
    colLower: new Float64Array(layout.numCols),
    colUpper,
    rowLower,
    rowUpper,
    matrix: { format: 'csc' as const, numRows, numCols: layout.numCols, starts, indices, values },
  };
}

/** The heuristic plan as arc flows, so HiGHS starts from it; null if some board has no path. */
function startingSolution(model: Model, plan: Packing, layout: Layout): Float64Array | null {
  const x = new Float64Array(layout.numCols);
  for (const b of plan.boards) {
    const bin = model.bins[b.bin];
    if (bin.source === 'stock' && isFullLength(model, bin, b.items)) {
      const f = layout.full.find((c) => c.item === b.items[0] && c.bin === b.bin);
      if (!f) return null;
      x[f.col]++;
      continue;
    }
    const open = bin.source === 'stock' && isOpenBoard(model, bin, b.items) && layout.graphs[1];
    const { graph, arcStart, returnStart } = layout.graphs[open ? 1 : 0];
    const ret = graph.entries.findIndex((r) => r.bin === b.bin);
    if (ret < 0) return null;
    const path = boardPath(model, graph, open ? bin.openCapacity : bin.capacity, b.items);
    if (!path) return null;
    for (const a of path) x[arcStart + a]++;
    x[returnStart + ret]++;
  }
  return x;
}

/** Splits the integer flow into boards (paths), drops pieces covered twice, checks every board. */
function decompose(model: Model, demand: number[], layout: Layout, x: number[]): Packing | null {
  const boards: PackedBoard[] = [];
  for (const f of layout.full)
    for (let k = 0; k < x[f.col]; k++) boards.push(makeBoard(model, f.bin, [f.item]));
  for (const { graph, arcStart, returnStart } of layout.graphs) {
    const outArcs: number[][] = graph.labels.map(() => []);
    graph.arcFrom.forEach((from, a) => {
      if (x[arcStart + a] > 0) outArcs[from].push(a);
    });
    const left = x.slice(arcStart, returnStart);
    // Flow is conserved, so a walk from where a board starts always reaches the shared end.
    for (const [k, entry] of graph.entries.entries()) {
      for (let n = 0; n < x[returnStart + k]; n++) {
        let node = entry.node;
        const items: number[] = [];
        while (node !== graph.end) {
          const next = outArcs[node].find((a) => left[a] > 0);
          if (next === undefined) return null;
          left[next]--;
          if (graph.arcItem[next] >= 0) items.push(graph.arcItem[next]);
          node = graph.arcTo[next];
        }
        if (items.length > 0) boards.push(makeBoard(model, entry.bin, items));
      }
    }
  }
  const surplus = [...demand];
  for (const b of boards) for (const i of b.items) surplus[i]--;
  const kept: PackedBoard[] = [];
  for (let k = boards.length - 1; k >= 0; k--) {
    const items = boards[k].items.filter((i) => (surplus[i] < 0 ? (surplus[i]++, false) : true));
    if (items.length > 0) kept.push(makeBoard(model, boards[k].bin, items));
  }
  if (surplus.some((s) => s > 0)) return null;
  if (kept.some((b) => !boardFits(model, b.bin, b.items))) return null;
  return { boards: kept.reverse(), unplaced: model.items.map(() => 0) };
}
