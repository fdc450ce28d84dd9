// Yard jobs at the sizes against the exact arc-flow reference (tests/solver/exact-reference.ts).
// Prints one line per job and returns a markdown table for docs/benchmarks.md.
import { prepareSolver } from '@/solver';
import { arcFlowCost } from '../../tests/solver/exact-reference';
import { checkPlan } from '../../tests/solver/plan-checker';
import { runInstance } from './run-instance';
import { generateSizedYardJob } from './yard-jobs';

const pence = (x: number) => Math.round(x * 100);

export async function runYardExact(count: number, median: (xs: number[]) => number): Promise<string> {
  await prepareSolver({ warmUp: true });
  const times: number[] = [];
  const cpuTimes: number[] = [];
  let peakRss = 0;
  let atOptimum = 0;
  let proven = 0;
  let compared = 0;
  let invalid = 0;
  let dearerThanLongestFirst = 0;
  let maxGap = 0;
  const misses: string[] = [];
  // Every job is solved first, then checked against the reference: the reference loads its own
  // HiGHS, whose memory would otherwise count towards the solver's peak.
  const runs = Array.from({ length: count }, (_, k) => {
    const job = generateSizedYardJob(k + 1, 1000);
    const r = runInstance(job);
    peakRss = Math.max(peakRss, process.memoryUsage().rss);
    return { job, r };
  });
  for (let seed = 1; seed <= count; seed++) {
    const { job, r } = runs[seed - 1];
    times.push(r.ms);
    cpuTimes.push(r.cpuMs);
    if (checkPlan(job, r.plan).length > 0 || r.plan.unplaced.length > 0) invalid++;
    const cost = pence(r.plan.totals.cost);
    if (cost > pence(r.ffdCost)) dearerThanLongestFirst++;
    if (r.plan.provenOptimal) proven++;
    const best = await arcFlowCost(job, 120);
    if (best !== null) {
      compared++;
      if (cost === best) atOptimum++;
      else misses.push(`#${seed} +${(((cost - best) / best) * 100).toFixed(2)} %`);
      if (best > 0) maxGap = Math.max(maxGap, (cost - best) / best);
    }
    const pieces = job.pieces.reduce((s, p) => s + p.quantity, 0);
    console.log(
      `yard-exact #${seed}: ${pieces} pieces, ${job.offcuts.length} offcuts, ${r.ms.toFixed(0)} ms (cpu ${r.cpuMs.toFixed(0)}), cost ${cost} p, exact ${best ?? 'not proven'} p${r.plan.provenOptimal ? ', proven' : ''}`,
    );
  }
  const n = times.length;
  console.log(
    `yard-exact: ${atOptimum}/${compared} at the exact optimum, max gap ${(maxGap * 100).toFixed(2)} %, proven ${proven}/${n}, median ${median(times).toFixed(0)} ms (cpu ${median(cpuTimes).toFixed(0)}), slowest ${Math.max(...times).toFixed(0)} ms (cpu ${Math.max(...cpuTimes).toFixed(0)}), peak RSS ${(peakRss / 1e6).toFixed(0)} MB, invalid ${invalid}, dearer than longest-first ${dearerThanLongestFirst}`,
  );
  return [
    '## Yard jobs against the exact optimum',
    '',
    `${n} jobs from \`generateSizedYardJob\` (scripts/bench/yard-jobs.ts, invented data of our own: one section,`,
    '4–8 stock lengths priced a little higher per metre for longer lengths, some capped, 0–40 free offcuts,',
    'kerf 3–5, trim 0–15, 8–600 pieces), `timeLimitMs` 1000. Exact reference: the arc-flow integer model in',
    'tests/solver/exact-reference.ts solved by HiGHS (120 s per job; jobs it does not prove are left out).',
    '',
    '| jobs | compared with exact | at exact optimum | max gap | proven by the solver | median ms | slowest ms | median CPU ms | slowest CPU ms | peak RSS | invalid | dearer than longest-first |',
    '|---|---|---|---|---|---|---|---|---|---|---|---|',
    `| ${n} | ${compared} | ${atOptimum} | ${(maxGap * 100).toFixed(2)} % | ${proven} | ${median(times).toFixed(0)} | ${Math.max(...times).toFixed(0)} | ${median(cpuTimes).toFixed(0)} | ${Math.max(...cpuTimes).toFixed(0)} | ${(peakRss / 1e6).toFixed(0)} MB | ${invalid} | ${dearerThanLongestFirst} |`,
    '',
    misses.length ? `Above the optimum: ${misses.join(', ')}.` : 'Every compared job at the optimum.',
    '',
  ].join('\n');
}
