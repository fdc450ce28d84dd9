// Exact references for cutting jobs, written independently of the solver: they read only the job.
// - bruteForceCost: tries every way to share out a handful of pieces over boards (tiny jobs), with
//   every rule of DESIGN.md's contract, nominal pieces and full lengths included.
// - arcFlowCost: the arc-flow integer model of J. M. Valério de Carvalho ("Exact solution of bin-packing
//   problems using column generation and branch-and-bound", Annals of OR 86, 1999), one graph for all
//   board kinds, solved by HiGHS. Exact pieces only (tolerance 0); a piece as long as a stock length
//   also gets a column of its own for the uncut, untrimmed board.
// Costs are returned in whole pence (prices in pounds with at most two decimals).
import highsLoader from 'highs';
import type { SolveInput } from '@/solver/types';

type Job = SolveInput;
type Piece = { length: number; tolerance: number };

const pence = (job: Job, s: Job['stock'][number]) => Math.round((s.cost ?? s.length / 1000) * 100);

/** Whether these pieces can be cut from one board of this length (stock or offcut). */
function fitsBoard(job: Job, length: number, isStock: boolean, pieces: Piece[]): boolean {
  if (pieces.length === 0) return true;
  const nominalOnly = pieces.every((p) => p.tolerance > 0);
  const whole =
    pieces.length === 1 && pieces[0].length - pieces[0].tolerance <= length && length <= pieces[0].length;
  if (whole) return true;
  const trimmed = isStock && !nominalOnly && job.trim > 0;
  const usable = trimmed ? length - job.trim - job.kerf : length;
  const shortest = pieces.reduce((s, p) => s + p.length - p.tolerance, 0);
  return shortest + (pieces.length - 1) * job.kerf <= usable;
}

/** Cheapest cost in pence placing every piece, or null if some piece cannot be placed. ≤ 7 pieces. */
export function bruteForceCost(job: Job): number | null {
  const pieces: Piece[] = job.pieces.flatMap((p) =>
    Array.from({ length: p.quantity }, () => ({ length: p.length, tolerance: p.tolerance ?? 0 })),
  );
  const boards = [
    ...job.offcuts.map((o) => ({ length: o.length, isStock: false, cost: 0, cap: 1 })),
    ...job.stock.map((s) => ({
      length: s.length,
      isStock: true,
      cost: pence(job, s),
      cap: s.available ?? Infinity,
    })),
  ];
  // Each piece goes to an open board or opens a new one of some kind; the board kinds used are counted.
  let best: number | null = null;
  const open: { kind: number; pieces: Piece[] }[] = [];
  const used = boards.map(() => 0);
  const place = (k: number, cost: number) => {
    if (best !== null && cost >= best) return;
    if (k === pieces.length) {
      best = cost;
      return;
    }
    const p = pieces[k];
    for (const b of open) {
      b.pieces.push(p);
      if (fitsBoard(job, boards[b.kind].length, boards[b.kind].isStock, b.pieces)) place(k + 1, cost);
      b.pieces.pop();
    }
    boards.forEach((kind, j) => {
      if (used[j] >= kind.cap || !fitsBoard(job, kind.length, kind.isStock, [p])) return;
      used[j]++;
      open.push({ kind: j, pieces: [p] });
      place(k + 1, cost + kind.cost);
      open.pop();
      used[j]--;
    });
  };
  place(0, 0);
  return best;
}

let engine: Awaited<ReturnType<typeof highsLoader>> | null = null;

/** Cheapest cost in pence by the arc-flow model, or null if infeasible / not proven in time. */
export async function arcFlowCost(job: Job, timeLimitSeconds = 60): Promise<number | null> {
  engine ??= await highsLoader();
  const kerf = job.kerf;
  const lengths = new Map<number, number>();
  for (const p of job.pieces) {
    if ((p.tolerance ?? 0) > 0) throw new Error('arc-flow reference: exact pieces only');
    lengths.set(p.length, (lengths.get(p.length) ?? 0) + p.quantity);
  }
  const items = [...lengths.entries()].sort((a, b) => b[0] - a[0]);
  const kinds = [
    ...job.stock
      .map((s, stock) => ({
        cap: s.length - job.trim - (job.trim > 0 ? kerf : 0) + kerf,
        cost: pence(job, s),
        limit: s.available ?? null,
        stock,
      }))
      .filter((k) => k.limit !== 0),
    ...job.offcuts.map((o) => ({ cap: o.length + kerf, cost: 0, limit: 1 as number | null, stock: -1 })),
  ].filter((k) => k.cap > 0);
  const top = Math.max(...kinds.map((k) => k.cap));
  // Nodes: loads reachable by taking piece lengths in decreasing order (a valid symmetry reduction).
  const reach = new Uint8Array(top + 1);
  reach[0] = 1;
  const arcs: { from: number; to: number; item: number }[] = [];
  items.forEach(([len], i) => {
    const w = len + kerf;
    for (let v = 0; v + w <= top; v++) {
      if (!reach[v]) continue;
      reach[v + w] = 1;
      arcs.push({ from: v, to: v + w, item: i });
    }
  });
  for (const k of kinds) reach[k.cap] = 1;
  const nodes: number[] = [];
  for (let v = 0; v <= top; v++) if (reach[v]) nodes.push(v);
  const lines: string[] = [];
  const obj: string[] = [];
  const flowIn = new Map<number, string[]>();
  const flowOut = new Map<number, string[]>();
  const push = (m: Map<number, string[]>, v: number, t: string) => m.set(v, [...(m.get(v) ?? []), t]);
  arcs.forEach((a, n) => {
    push(flowOut, a.from, `a${n}`);
    push(flowIn, a.to, `a${n}`);
  });
  for (let n = 0; n + 1 < nodes.length; n++) {
    push(flowOut, nodes[n], `s${n}`);
    push(flowIn, nodes[n + 1], `s${n}`);
  }
  kinds.forEach((k, j) => {
    obj.push(`${k.cost} z${j}`);
    push(flowOut, k.cap, `z${j}`);
  });
  const demandRows = items.map(([, count], i) => {
    const vars = arcs.flatMap((a, n) => (a.item === i ? [`a${n}`] : []));
    return { vars, count };
  });
  // Full length: a piece as long as a stock length, sold uncut (only matters with a trim).
  const whole: string[] = [];
  job.stock.forEach((s, j) => {
    if (s.available === 0 || job.trim === 0) return;
    const i = items.findIndex(([len]) => len === s.length);
    if (i < 0) return;
    const name = `w${j}`;
    whole.push(name);
    obj.push(`${pence(job, s)} ${name}`);
    demandRows[i].vars.push(name);
  });
  lines.push('Minimize', ` obj: ${wrap(obj)}`, 'Subject To');
  for (const v of nodes) {
    const out = flowOut.get(v) ?? [];
    const inn = flowIn.get(v) ?? [];
    // Flow conservation; at the start node the boards' paths leave and the sinks bring them back.
    const plus = v === 0 ? kinds.map((_, j) => `z${j}`) : inn;
    if (out.length + plus.length > 0) lines.push(` n${v}: ${signed(plus, out)} = 0`);
  }
  demandRows.forEach((r, i) => lines.push(` d${i}: ${wrap(r.vars)} >= ${r.count}`));
  kinds.forEach((k, j) => {
    if (k.limit === null) return;
    const extra = whole.includes(`w${k.stock}`) ? ` + w${k.stock}` : '';
    lines.push(` l${j}: z${j}${extra} <= ${k.limit}`);
  });
  lines.push(
    'General',
    ` ${[...arcs.map((_, n) => `a${n}`), ...kinds.map((_, j) => `z${j}`), ...whole].join(' ')}`,
  );
  lines.push('End');
  const res = engine.solve(lines.join('\n'), {
    time_limit: timeLimitSeconds,
    mip_rel_gap: 0,
    mip_abs_gap: 0.5,
    output_flag: false,
  });
  if (res.Status !== 'Optimal') return null;
  return Math.round(res.ObjectiveValue);
}

function signed(plus: string[], minus: string[]): string {
  const terms = [...plus.map((t) => `+ ${t}`), ...minus.map((t) => `- ${t}`)];
  const rows: string[] = [];
  for (let k = 0; k < terms.length; k += 12) rows.push(terms.slice(k, k + 12).join(' '));
  return rows.join('\n ');
}

function wrap(terms: string[]): string {
  const rows: string[] = [];
  for (let k = 0; k < terms.length; k += 12) rows.push(terms.slice(k, k + 12).join(' + '));
  return rows.join('\n + ');
}
