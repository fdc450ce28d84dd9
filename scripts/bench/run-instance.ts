// Runs one job through the solver and through plain first-fit decreasing, for side-by-side figures.
import { solve } from '@/solver';
import type { SolveInput, SolvePlan } from '@/solver/types';

export interface RunResult {
  plan: SolvePlan;
  ms: number;
  /** Processor time of this process while solving: a fairer figure than ms when the machine is shared. */
  cpuMs: number;
  ffdBoards: number;
  ffdCost: number;
}

/** Plain FFD on the longest stock length (cheapest per mm on ties), written here independently of the solver. */
export function firstFitDecreasingBoards(job: SolveInput): { boards: number; cost: number } {
  const pieces = job.pieces.flatMap((p) => Array<number>(p.quantity).fill(p.length)).sort((a, b) => b - a);
  const open: { free: number; cost: number; isStock: boolean }[] = [];
  const offcuts = [...job.offcuts]
    .sort((a, b) => a.length - b.length)
    .map((o) => ({ free: o.length + job.kerf, used: false }));
  const stock = [...job.stock].sort((a, b) => b.length - a.length);
  const usedStock = new Map<string, number>();
  for (const len of pieces) {
    const w = len + job.kerf;
    const board = open.find((b) => b.free >= w);
    if (board) {
      board.free -= w;
      continue;
    }
    const off = offcuts.find((o) => !o.used && o.free >= w);
    if (off) {
      off.used = true;
      open.push({ free: off.free - w, cost: 0, isStock: false });
      continue;
    }
    const s = stock.find((st) => {
      const cap = st.length - job.trim - (job.trim > 0 ? job.kerf : 0) + job.kerf;
      return cap >= w && (st.available == null || (usedStock.get(st.id) ?? 0) < st.available);
    });
    if (!s) continue;
    usedStock.set(s.id, (usedStock.get(s.id) ?? 0) + 1);
    const cap = s.length - job.trim - (job.trim > 0 ? job.kerf : 0) + job.kerf;
    open.push({ free: cap - w, cost: s.cost ?? s.length / 1000, isStock: true });
  }
  return { boards: open.length, cost: open.reduce((c, b) => c + b.cost, 0) };
}

export function runInstance(job: SolveInput): RunResult {
  const t0 = performance.now();
  const cpu0 = process.cpuUsage();
  const plan = solve(job);
  const ms = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  const cpuMs = (cpu.user + cpu.system) / 1000;
  const ffd = firstFitDecreasingBoards(job);
  return { plan, ms, cpuMs, ffdBoards: ffd.boards, ffdCost: ffd.cost };
}
