// The arc-flow graph, compressed. Every board kind is laid out against one shared end: a board of
// capacity c starts at position top − c, so a path from there to `top` holds at most c, and all
// kinds meet in one end node. Positions are then relabelled by the furthest position from which
// every continuation still fits (G. Brandão, J. P. Pedroso, "Bin packing and related problems:
// general arc-flow formulation with graph compression", Computers & OR 69, 2016) and positions with
// the same label are merged: every pattern stays in the graph, with a fraction of the nodes and arcs.

import type { Model } from './model';

export interface ArcFlowGraph {
  /** Label of each node, ascending; the last node is the shared end (`top`). */
  labels: number[];
  end: number;
  arcFrom: number[];
  arcTo: number[];
  /** Item type of a piece arc, −1 for a loss arc (straight to the end). */
  arcItem: number[];
  /** Piece arc by `${from}/${to}/${item}`. */
  pieceArc: Map<string, number>;
  /** Loss arc leaving each node (−1 at the end). */
  lossOf: number[];
  /** Where each board kind's boards start; kinds that can hold no piece are left out (maybe all). */
  entries: { bin: number; node: number }[];
  /** Node of each position of the uncompressed layout (−1 where none), to map a known plan in. */
  nodeOfPosition: Int32Array;
  /** Largest capacity: positions run from top − capacity to top. */
  top: number;
}

/** Graphs above this many arcs are not built (memory and time on a shared 2-core machine). */
const MAX_RAW_ARCS = 400_000;

export function buildArcFlowGraph(
  model: Model,
  demand: number[],
  itemOk: (i: number) => boolean,
  capacities: { bin: number; cap: number }[],
  maxArcs: number,
): ArcFlowGraph | null {
  if (capacities.length === 0) return null;
  const top = Math.max(...capacities.map((c) => c.cap));
  const reached = new Uint8Array(top + 1);
  for (const c of capacities) reached[top - c.cap] = 1;
  const used = new Int32Array(top + 1);
  const rawFrom: number[] = [];
  const rawItem: number[] = [];
  // Items longest first, each path takes them in that order and never more than are ordered.
  model.items.forEach((it, i) => {
    if (!itemOk(i) || demand[i] === 0) return;
    const w = it.weight;
    used.fill(0);
    for (let v = 0; v + w <= top; v++) {
      if (!reached[v] || used[v] >= demand[i]) continue;
      rawFrom.push(v);
      rawItem.push(i);
      const to = v + w;
      if (!reached[to]) {
        reached[to] = 1;
        used[to] = used[v] + 1;
      } else if (used[to] > used[v] + 1) used[to] = used[v] + 1;
    }
  });
  if (rawFrom.length > MAX_RAW_ARCS) return null;
  // Label: the furthest start from which every path onwards still ends by `top`.
  const label = new Int32Array(top + 1).fill(top);
  const order = Array.from(rawFrom.keys()).sort((a, b) => rawFrom[b] - rawFrom[a]);
  for (const a of order) {
    const v = rawFrom[a];
    const l = label[v + model.items[rawItem[a]].weight] - model.items[rawItem[a]].weight;
    if (l < label[v]) label[v] = l;
  }
  const distinct = new Set<number>([top]);
  for (let v = 0; v <= top; v++) if (reached[v]) distinct.add(label[v]);
  const labels = [...distinct].sort((a, b) => a - b);
  const nodeOfLabel = new Map(labels.map((l, k) => [l, k] as const));
  const nodeOfPosition = new Int32Array(top + 1).fill(-1);
  for (let v = 0; v <= top; v++) if (reached[v]) nodeOfPosition[v] = nodeOfLabel.get(label[v])!;
  const end = labels.length - 1;
  nodeOfPosition[top] = end;
  const g: ArcFlowGraph = {
    labels,
    end,
    arcFrom: [],
    arcTo: [],
    arcItem: [],
    pieceArc: new Map(),
    lossOf: labels.map(() => -1),
    entries: [],
    nodeOfPosition,
    top,
  };
  rawFrom.forEach((v, a) => {
    const i = rawItem[a];
    const from = nodeOfPosition[v];
    const to = nodeOfPosition[v + model.items[i].weight];
    const key = `${from}/${to}/${i}`;
    if (g.pieceArc.has(key)) return;
    g.pieceArc.set(key, g.arcFrom.length);
    g.arcFrom.push(from);
    g.arcTo.push(to);
    g.arcItem.push(i);
  });
  for (let k = 0; k < end; k++) {
    g.lossOf[k] = g.arcFrom.length;
    g.arcFrom.push(k);
    g.arcTo.push(end);
    g.arcItem.push(-1);
  }
  if (g.arcFrom.length > maxArcs) return null;
  for (const c of capacities) {
    const node = nodeOfPosition[top - c.cap];
    if (node !== end) g.entries.push({ bin: c.bin, node });
  }
  return g;
}

/** The arcs a board takes through the graph, pieces longest first; null if it has no path. */
export function boardPath(model: Model, g: ArcFlowGraph, cap: number, items: number[]): number[] | null {
  const arcs: number[] = [];
  let pos = g.top - cap;
  let node = g.nodeOfPosition[pos];
  for (const i of [...items].sort((p, q) => p - q)) {
    pos += model.items[i].weight;
    if (pos > g.top) return null;
    const to = g.nodeOfPosition[pos];
    const a = g.pieceArc.get(`${node}/${to}/${i}`);
    if (a === undefined) return null;
    arcs.push(a);
    node = to;
  }
  if (node !== g.end) arcs.push(g.lossOf[node]);
  return arcs;
}
