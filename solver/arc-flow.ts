// The complete integer step: the arc-flow model (J. M. Valério de Carvalho, "Exact solution of
// bin-packing problems using column generation and branch-and-bound", Annals of OR 86, 1999) over
// every board kind at once, solved by HiGHS. A board is a path of piece arcs from 0 to its kind's
// capacity (loss arcs fill the rest), so every pattern is in the model and HiGHS's optimum is the
// job's cheapest cost, not just the cheapest over a pool. Boards of only nominal pieces may be
// untrimmed: they get a second graph with the untrimmed capacities; a piece sold full length is a
// column of its own. The heuristics' best plan is handed over as the starting solution, and a
// callback stops HiGHS at our own deadline, because its own clock is checked too rarely here.

import { boardFits, isFullLength, isOpenBoard } from './board-fit';
import { highsEngine, runUntil } from './highs-engine';
import type { Model } from './model';
import { costStep } from './money';
import { makeBoard, type PackedBoard, type Packing } from './packing';

/** Graphs above this many arcs are not built (memory and time on a shared 2-core machine). */
const MAX_ARCS = 30_000;

export interface ArcFlowResult {
  /** Cheapest plan HiGHS found (checked with the engine's own fit rules), or null. */
  packing: Packing | null;
  /** Lower bound on the cost in money units, already rounded up to a cost a plan can have. */
  boundUnits: number;
  /** True when HiGHS closed the gap: `packing` is the cheapest plan there is. */
  proven: boolean;
}

/** One graph: nodes are positions along a board (mm + kerf); arcs cut a piece or waste a stretch. */
interface Graph {
  positions: number[];
  arcFrom: number[];
  arcTo: number[];
  /** Item type of a piece arc, −1 for a loss arc. */
  arcItem: number[];
  /** Loss arc leaving each node (−1 at the last). */
  lossOf: number[];
  /** Piece arc by `from * items + item`. */
  pieceArc: Map<number, number>;
  /** Board kinds this graph closes, and the node of each kind's capacity. */
  returns: { bin: number; node: number }[];
}

function buildGraph(
  model: Model,
  demand: number[],
  itemOk: (i: number) => boolean,
  capacities: { bin: number; cap: number }[],
): Graph | null {
  const top = Math.max(0, ...capacities.map((c) => c.cap));
  const reached = new Uint8Array(top + 1);
  reached[0] = 1;
  const used = new Int32Array(top + 1);
  const pieceStarts: [number, number][] = [];
  // Items longest first, each path takes them in that order and never more than are ordered.
  model.items.forEach((it, i) => {
    if (!itemOk(i) || demand[i] === 0) return;
    const w = it.weight;
    used.fill(0);
    for (let v = 0; v + w <= top; v++) {
      if (!reached[v] || used[v] >= demand[i]) continue;
      pieceStarts.push([v, i]);
      const to = v + w;
      if (!reached[to]) {
        reached[to] = 1;
        used[to] = used[v] + 1;
      } else if (used[to] > used[v] + 1) used[to] = used[v] + 1;
    }
  });
  if (pieceStarts.length > MAX_ARCS) return null;
  // A position no piece leaves can only waste its way to a board end, so its arcs go straight to
  // the nearest board end at or after it (an exact reduction: fewer nodes, same paths).
  const isEnd = new Uint8Array(top + 1);
  for (const c of capacities) isEnd[c.cap] = 1;
  const hasOut = new Uint8Array(top + 1);
  for (const [v] of pieceStarts) hasOut[v] = 1;
  const target = new Int32Array(top + 1);
  for (let v = top, end = top; v >= 0; v--) {
    if (isEnd[v]) end = v;
    target[v] = hasOut[v] || isEnd[v] ? v : end;
  }
  const nodeOf = new Int32Array(top + 1).fill(-1);
  const positions: number[] = [];
  for (let v = 0; v <= top; v++) if (v === 0 || hasOut[v] || isEnd[v]) nodeOf[v] = positions.push(v) - 1;
  const g: Graph = {
    positions,
    arcFrom: [],
    arcTo: [],
    arcItem: [],
    lossOf: positions.map(() => -1),
    pieceArc: new Map(),
    returns: capacities.map((c) => ({ bin: c.bin, node: nodeOf[c.cap] })),
  };
  const n = model.items.length;
  for (const [v, i] of pieceStarts) {
    g.pieceArc.set(nodeOf[v] * n + i, g.arcFrom.length);
    g.arcFrom.push(nodeOf[v]);
    g.arcTo.push(nodeOf[target[v + model.items[i].weight]]);
    g.arcItem.push(i);
  }
  for (let k = 0; k + 1 < positions.length; k++) {
    g.lossOf[k] = g.arcFrom.length;
    g.arcFrom.push(k);
    g.arcTo.push(k + 1);
    g.arcItem.push(-1);
  }
  return g;
}

/** Columns of the model, in order: each graph's arcs then its returns, then full-length boards. */
interface Layout {
  graphs: { graph: Graph; arcStart: number; returnStart: number }[];
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
  const trimmed = buildGraph(
    model,
    demand,
    () => true,
    model.bins.flatMap((b, j) => (limits[j] > 0 && b.capacity > 0 ? [{ bin: j, cap: b.capacity }] : [])),
  );
  if (!trimmed) return null;
  const graphs = [trimmed];
  const nominal = model.items.some((it, i) => it.tolerance > 0 && demand[i] > 0);
  if (nominal && open.some((o, j) => o && limits[j] > 0)) {
    const untrimmed = buildGraph(
      model,
      demand,
      (i) => model.items[i].tolerance > 0,
      model.bins.flatMap((b, j) => (open[j] && limits[j] > 0 ? [{ bin: j, cap: b.openCapacity }] : [])),
    );
    if (!untrimmed) return null;
    graphs.push(untrimmed);
  }
  const layout: Layout = { graphs: [], full: [], numCols: 0 };
  for (const graph of graphs) {
    const arcStart = layout.numCols;
    const returnStart = arcStart + graph.arcFrom.length;
    layout.graphs.push({ graph, arcStart, returnStart });
    layout.numCols = returnStart + graph.returns.length;
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
    const boundUnits = Number.isFinite(dual) ? Math.ceil(dual - 1e-6) * step : 0;
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
    numRows += graph.positions.length;
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
    graph.returns.forEach((ret, k) => {
      const c = returnStart + k;
      cols[c].push([r0 + ret.node, -1], [r0, 1]);
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
  const n = model.items.length;
  for (const b of plan.boards) {
    const bin = model.bins[b.bin];
    if (bin.source === 'stock' && isFullLength(model, bin, b.items)) {
      const f = layout.full.find((c) => c.item === b.items[0] && c.bin === b.bin);
      if (!f) return null;
      x[f.col]++;
      continue;
    }
    const g = bin.source === 'stock' && isOpenBoard(model, bin, b.items) && layout.graphs[1] ? 1 : 0;
    const { graph, arcStart, returnStart } = layout.graphs[g];
    const ret = graph.returns.findIndex((r) => r.bin === b.bin);
    if (ret < 0) return null;
    let node = 0;
    for (const i of [...b.items].sort((p, q) => p - q)) {
      const a = graph.pieceArc.get(node * n + i);
      if (a === undefined) return null;
      x[arcStart + a]++;
      node = graph.arcTo[a];
    }
    const end = graph.returns[ret].node;
    if (node > end) return null;
    for (; node < end; node++) x[arcStart + graph.lossOf[node]]++;
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
    const flow = (a: number) => x[arcStart + a];
    const outArcs: number[][] = graph.positions.map(() => []);
    graph.arcFrom.forEach((from, a) => {
      if (flow(a) > 0) outArcs[from].push(a);
    });
    const returnsAt = new Map<number, number[]>();
    graph.returns.forEach((r, k) => {
      if (x[returnStart + k] > 0) returnsAt.set(r.node, [...(returnsAt.get(r.node) ?? []), k]);
    });
    const left = x.slice(arcStart, returnStart);
    const retLeft = x.slice(returnStart, returnStart + graph.returns.length);
    let boardsLeft = retLeft.reduce((s, v) => s + v, 0);
    for (; boardsLeft > 0; boardsLeft--) {
      let node = 0;
      const items: number[] = [];
      for (;;) {
        const next = outArcs[node].find((a) => left[a] > 0);
        if (next === undefined) break;
        left[next]--;
        if (graph.arcItem[next] >= 0) items.push(graph.arcItem[next]);
        node = graph.arcTo[next];
      }
      const k = (returnsAt.get(node) ?? []).find((r) => retLeft[r] > 0);
      if (k === undefined) return null;
      retLeft[k]--;
      if (items.length > 0) boards.push(makeBoard(model, graph.returns[k].bin, items));
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
  return { boards: kept.reverse(), unplaced: model.items.map(() => 0) };
}
