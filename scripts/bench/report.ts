// Renders the benchmark tables as Markdown for docs/benchmarks.md.
import os from 'node:os';

export interface SetRow {
  set: string;
  instances: number;
  atOptimum: number;
  boardsAbove: number;
  proven: number;
  medianMs: number;
  slowestMs: number;
  ffdAtOptimum: number;
  ffdBoardsAbove: number;
  target: string;
  misses: string[];
  invalid: number;
}

export interface YardRow {
  seed: number;
  ms: number;
  boards: number;
  boundBoards: number;
  cost: number;
  boundCost: number;
  costGapInBoards: number;
  ffdBoards: number;
  ffdCost: number;
  offcutsUsed: number;
  yieldPercent: number;
  unplaced: number;
}

/** Plain verdicts against the targets set for the engine. */
function verdicts(r: {
  setRows: SetRow[];
  yardRows: YardRow[];
  peakMb: number;
  median: (xs: number[]) => number;
}): string[] {
  const out: string[] = [];
  for (const s of r.setRows) {
    const share = s.atOptimum / s.instances;
    let met: boolean;
    let want: string;
    if (s.set === 'scholl_1') {
      met = share >= 0.99 && s.slowestMs < 2000;
      want = '≥ 99 % at optimum, each < 2 s';
    } else if (s.set === 'hard28') {
      met = s.atOptimum >= 10 && s.slowestMs <= 10000;
      want = '≥ 10 of 28 at optimum within 10 s each';
    } else {
      met = share === 1 && s.slowestMs < 2000;
      want = 'every instance at optimum, each < 2 s';
    }
    out.push(
      `- ${s.set}: target ${want} — **${met ? 'met' : 'MISSED'}** (${s.atOptimum}/${s.instances} at optimum, slowest ${(s.slowestMs / 1000).toFixed(2)} s${s.invalid ? `, ${s.invalid} invalid or incomplete plans` : ', no invalid plans'}).`,
    );
  }
  if (r.yardRows.length) {
    const med = r.median(r.yardRows.map((y) => y.ms));
    const worst = Math.max(...r.yardRows.map((y) => y.costGapInBoards));
    const met = med < 1000 && worst <= 1;
    out.push(
      `- yard jobs: target median < 1 s and within one board of the lower bound — **${met ? 'met' : 'MISSED'}** (median ${med.toFixed(0)} ms, largest cost gap ${worst.toFixed(2)} boards of the dearest length).`,
    );
  }
  out.push(
    `- peak memory: target < 300 MB — **${r.peakMb < 300 ? 'met' : 'MISSED'}** (${r.peakMb.toFixed(0)} MB).`,
  );
  return out;
}

export function renderReport(r: {
  setRows: SetRow[];
  yardRows: YardRow[];
  peakMb: number;
  median: (xs: number[]) => number;
}): string {
  const lines: string[] = [];
  lines.push('# Solver benchmarks', '');
  lines.push(
    `Measured by \`npm run bench\` on ${new Date().toISOString().slice(0, 10)}, Node ${process.version}, ${os.cpus().length} cores shared with other work (timings are noisy).`,
  );
  lines.push(
    'Benchmark data: BPPLIB (Delorme, Iori, Martello 2018), read from `../shared/benchmarks`; sets by Falkenauer (1996), Scholl, Klein & Jürgens (1997), Schoenfield (2002). Bin packing is mapped onto the contract with kerf 0, trim 0, unit cost.',
    '',
  );
  lines.push(
    '| set | instances | at optimum | boards above optimum | proven by own bound | median ms | slowest ms | FFD at optimum | FFD boards above | target |',
  );
  lines.push('| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |');
  for (const s of r.setRows) {
    lines.push(
      `| ${s.set} | ${s.instances} | ${s.atOptimum} (${((100 * s.atOptimum) / s.instances).toFixed(1)} %) | ${s.boardsAbove} | ${s.proven} | ${s.medianMs.toFixed(0)} | ${s.slowestMs.toFixed(0)} | ${s.ffdAtOptimum} | ${s.ffdBoardsAbove} | ${s.target} |`,
    );
  }
  lines.push('');
  for (const s of r.setRows.filter((x) => x.misses.length))
    lines.push(`- ${s.set} missed (found/optimum): ${s.misses.join(', ')}`);
  if (r.yardRows.length) {
    const ms = r.yardRows.map((y) => y.ms);
    lines.push(
      '',
      '## Yard jobs (seeded generator of our own: 500 pieces, 6 stock lengths, 60 offcuts, kerf 3, trim 10)',
      '',
    );
    lines.push(
      `Median ${r.median(ms).toFixed(0)} ms, slowest ${Math.max(...ms).toFixed(0)} ms. Target: median under 1 s, within one board of the lower bound.`,
      '',
    );
    lines.push(
      '| seed | ms | boards | LB boards | cost | LB cost | cost gap (in longest boards) | offcuts used | yield % | FFD boards | FFD cost |',
    );
    lines.push('| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |');
    for (const y of r.yardRows) {
      lines.push(
        `| ${y.seed} | ${y.ms.toFixed(0)} | ${y.boards} | ${y.boundBoards} | ${y.cost.toFixed(2)} | ${y.boundCost.toFixed(2)} | ${y.costGapInBoards.toFixed(2)} | ${y.offcutsUsed} | ${y.yieldPercent} | ${y.ffdBoards} | ${y.ffdCost.toFixed(2)} |`,
      );
    }
  }
  lines.push('', `Peak memory (RSS of the bench process): ${r.peakMb.toFixed(0)} MB (target < 300 MB).`, '');
  lines.push('## Against the targets', '', ...verdicts(r), '');
  lines.push(
    '## Notes',
    '',
    `- Load average when this file was written: ${os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(
        ' / ',
      )} (1/5/15 min) on ${os.cpus().length} cores; other developers were building and testing at the same time, so times are upper figures.`,
    '- "proven by own bound": the plan meets the solver\'s own lower bound (ceil of the pattern LP, or the length bound), so it is optimal without looking at optima.csv.',
    '- Time limits given to the solver: 2 s for Falkenauer and Scholl, 10 s for Hard28, 2 s (the contract default) for yard jobs, whose target is on the measured median. The search stops at 90 % of the limit; a plan is never discarded for lack of time, the best so far comes back.',
    '- Yard jobs: costs differ per stock length (dearer per metre when longer), so the plan minimises cost and may use more, shorter boards; "LB boards" there is only the length bound. The cost gap is measured against the pattern-LP bound and expressed in boards of the dearest stock length.',
    '- FFD columns: plain first-fit decreasing written independently in `scripts/bench/run-instance.ts` (offcuts first, then the longest stock length).',
    '- Hard28: the master LP (our dense simplex, warm-started from the first plan, with dual smoothing) needs about 8 000–11 000 pivots, about 2–3 s at moderate load, so it now finishes inside the limit; every miss is one board over, a board which LP rounding, bin completion and repacking do not close on most instances (5 of the 28 are not even proven by ceil(LP): BPP14, 119, 175, 359, 716). Closing more needs a faster master LP (sparse LU instead of the dense inverse: each pivot is O(m²) with m ≈ 140–200) and a stronger residual search.',
    '',
  );
  lines.push(
    'Every benchmark plan in these runs was checked by the independent checker `tests/solver/plan-checker.ts` (the bench prints any invalid yard plan); the property tests in `tests/solver` check validity on generated jobs.',
    '',
  );
  return lines.join('\n');
}
