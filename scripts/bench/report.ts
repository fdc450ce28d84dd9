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

export function renderReport(r: { setRows: SetRow[]; yardRows: YardRow[]; peakMb: number; median: (xs: number[]) => number }): string {
  const lines: string[] = [];
  lines.push('# Solver benchmarks', '');
  lines.push(`Measured by \`npm run bench\` on ${new Date().toISOString().slice(0, 10)}, Node ${process.version}, ${os.cpus().length} cores shared with other work (timings are noisy).`);
  lines.push('Benchmark data: BPPLIB (Delorme, Iori, Martello 2018), read from `../shared/benchmarks`; sets by Falkenauer (1996), Scholl, Klein & Jürgens (1997), Schoenfield (2002). Bin packing is mapped onto the contract with kerf 0, trim 0, unit cost.', '');
  lines.push('| set | instances | at optimum | boards above optimum | proven by own bound | median ms | slowest ms | FFD at optimum | FFD boards above | target |');
  lines.push('| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |');
  for (const s of r.setRows) {
    lines.push(
      `| ${s.set} | ${s.instances} | ${s.atOptimum} (${((100 * s.atOptimum) / s.instances).toFixed(1)} %) | ${s.boardsAbove} | ${s.proven} | ${s.medianMs.toFixed(0)} | ${s.slowestMs.toFixed(0)} | ${s.ffdAtOptimum} | ${s.ffdBoardsAbove} | ${s.target} |`,
    );
  }
  lines.push('');
  for (const s of r.setRows.filter((x) => x.misses.length)) lines.push(`- ${s.set} missed (found/optimum): ${s.misses.join(', ')}`);
  if (r.yardRows.length) {
    const ms = r.yardRows.map((y) => y.ms);
    lines.push('', '## Yard jobs (seeded generator of our own: 500 pieces, 6 stock lengths, 60 offcuts, kerf 3, trim 10)', '');
    lines.push(`Median ${r.median(ms).toFixed(0)} ms, slowest ${Math.max(...ms).toFixed(0)} ms. Target: median under 1 s, within one board of the lower bound.`, '');
    lines.push('| seed | ms | boards | LB boards | cost | LB cost | cost gap (in longest boards) | offcuts used | yield % | FFD boards | FFD cost |');
    lines.push('| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |');
    for (const y of r.yardRows) {
      lines.push(
        `| ${y.seed} | ${y.ms.toFixed(0)} | ${y.boards} | ${y.boundBoards} | ${y.cost.toFixed(2)} | ${y.boundCost.toFixed(2)} | ${y.costGapInBoards.toFixed(2)} | ${y.offcutsUsed} | ${y.yieldPercent} | ${y.ffdBoards} | ${y.ffdCost.toFixed(2)} |`,
      );
    }
  }
  lines.push('', `Peak memory (RSS of the bench process): ${r.peakMb.toFixed(0)} MB (target < 300 MB).`, '');
  return lines.join('\n');
}
