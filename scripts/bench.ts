// npm run bench [-- --set hard28,falkenauer_u120,yard,yard-exact] [--limit 20] [--only Hard28_BPP13,…] [--yard 20] [--exact 80] [--write]
// Runs the public benchmark sets (read from ../shared/benchmarks) and seeded yard jobs, side by side
// with first-fit decreasing. Prints tables; writes docs/benchmarks.md on a full run or with --write.
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadInstance, readOptima, toSolveInput } from './bench/benchmark-files';
import { runInstance } from './bench/run-instance';
import { generateYardJob } from './bench/yard-jobs';
import { renderReport, type SetRow, type YardRow } from './bench/report';
import { runYardExact } from './bench/yard-exact';
import { keptLoadSection } from './bench-load-table';
import { prepareSolver } from '@/solver';
import { checkPlan } from '../tests/solver/plan-checker';

const SET_LIMITS: Record<string, { timeLimitMs: number; target: string }> = {
  falkenauer_u120: { timeLimitMs: 2000, target: 'all at optimum, each < 2 s' },
  falkenauer_t60: { timeLimitMs: 2000, target: 'all at optimum, each < 2 s' },
  falkenauer_t120: { timeLimitMs: 2000, target: 'all at optimum, each < 2 s' },
  scholl_1: { timeLimitMs: 2000, target: '≥ 99 % at optimum, each < 2 s' },
  hard28: { timeLimitMs: 10000, target: '≥ 10 of 28 at optimum, each < 10 s' },
};

function arg(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const chosen = arg('set')?.split(',') ?? [...Object.keys(SET_LIMITS), 'yard', 'yard-exact'];
const limit = Number(arg('limit') ?? Infinity);
// Instance names to run (for working on one instance at a time); the others are skipped.
const only = arg('only')?.split(',');
const yardCount = Number(arg('yard') ?? 20);
const full = !arg('set') && !arg('limit') && !only;
const write = full || process.argv.includes('--write');
let peakRss = 0;
const sample = () => (peakRss = Math.max(peakRss, process.memoryUsage().rss));

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? (s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2) : 0;
};

// The product loads the integer step in its worker; the bench measures the same engine.
await prepareSolver({ warmUp: true });
const setRows: SetRow[] = [];
const published = chosen.filter((s) => s in SET_LIMITS);
const all = published.length > 0 ? readOptima() : [];
for (const set of published) {
  const list = all.filter((i) => i.set === set && (!only || only.includes(i.name))).slice(0, limit);
  const times: number[] = [];
  let atOpt = 0;
  let above = 0;
  let ffdOpt = 0;
  let ffdAbove = 0;
  let proven = 0;
  let invalid = 0;
  const misses: string[] = [];
  for (const meta of list) {
    const inst = loadInstance(meta);
    const job = toSolveInput(inst, SET_LIMITS[set].timeLimitMs);
    const r = runInstance(job);
    sample();
    if (checkPlan(job, r.plan).length > 0 || r.plan.unplaced.length > 0) invalid++;
    times.push(r.ms);
    const boards = r.plan.totals.boards;
    if (boards === inst.optimum) atOpt++;
    else misses.push(`${inst.name} ${boards}/${inst.optimum}`);
    above += boards - inst.optimum;
    if (r.plan.provenOptimal) proven++;
    if (r.ffdBoards === inst.optimum) ffdOpt++;
    ffdAbove += r.ffdBoards - inst.optimum;
  }
  const row: SetRow = {
    set,
    instances: list.length,
    atOptimum: atOpt,
    boardsAbove: above,
    proven,
    medianMs: median(times),
    slowestMs: Math.max(...times),
    ffdAtOptimum: ffdOpt,
    ffdBoardsAbove: ffdAbove,
    target: SET_LIMITS[set].target,
    misses,
    invalid,
  };
  setRows.push(row);
  console.log(
    `${set.padEnd(16)} n=${row.instances} opt=${atOpt} above=${above} proven=${proven} median=${row.medianMs.toFixed(0)}ms slowest=${row.slowestMs.toFixed(0)}ms | FFD opt=${ffdOpt} above=${ffdAbove}`,
  );
  if (misses.length) console.log(`  missed: ${misses.join(', ')}`);
  // Peak so far (the OS's figure) and what typed arrays and WebAssembly memory hold now.
  const mem = process.memoryUsage();
  console.log(
    `  peak RSS so far ${((process.resourceUsage().maxRSS * 1024) / 1048576).toFixed(0)} MB; now: JS heap ${(mem.heapUsed / 1048576).toFixed(0)} MB, array buffers and WebAssembly ${(mem.arrayBuffers / 1048576).toFixed(0)} MB`,
  );
}

const yardRows: YardRow[] = [];
if (chosen.includes('yard')) {
  for (let seed = 1; seed <= yardCount; seed++) {
    const job = generateYardJob(seed);
    const r = runInstance(job);
    sample();
    const errors = checkPlan(job, r.plan);
    if (errors.length > 0) console.log(`  INVALID yard plan #${seed}: ${errors[0]}`);
    const longest = Math.max(...job.stock.map((s) => s.cost ?? s.length / 1000));
    yardRows.push({
      seed,
      ms: r.ms,
      boards: r.plan.totals.boards,
      boundBoards: r.plan.lowerBound.boards,
      cost: r.plan.totals.cost,
      boundCost: r.plan.lowerBound.cost,
      costGapInBoards: (r.plan.totals.cost - r.plan.lowerBound.cost) / longest,
      ffdBoards: r.ffdBoards,
      ffdCost: r.ffdCost,
      offcutsUsed: r.plan.totals.offcutsUsed,
      yieldPercent: r.plan.totals.yieldPercent,
      unplaced: r.plan.unplaced.length,
    });
    const y = yardRows[yardRows.length - 1];
    console.log(
      `yard #${seed}: ${y.ms.toFixed(0)}ms boards=${y.boards} (lb ${y.boundBoards}) cost=${y.cost.toFixed(2)} (lb ${y.boundCost.toFixed(2)}, gap ${y.costGapInBoards.toFixed(2)} boards) | FFD boards=${y.ffdBoards} cost=${y.ffdCost.toFixed(2)}`,
    );
  }
}

const exactSection = chosen.includes('yard-exact')
  ? await runYardExact(Number(arg('exact') ?? 80), median)
  : '';
sample();

const peakMb = Math.max(peakRss, process.resourceUsage().maxRSS * 1024) / 1048576;
console.log(`peak memory ${peakMb.toFixed(0)} MB`);
if (write) {
  const out = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../docs/benchmarks.md');
  // The load benchmark's section (npm run bench:load) is measured separately: keep it.
  const load = keptLoadSection(existsSync(out) ? readFileSync(out, 'utf8') : '');
  writeFileSync(out, `${renderReport({ setRows, yardRows, peakMb, median })}\n${exactSection}${load}`);
  console.log(`wrote ${out}`);
}
