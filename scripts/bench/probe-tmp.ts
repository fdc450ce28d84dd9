import { solve, prepareSolver } from '@/solver';
import { arcFlowCost } from '../../tests/solver/exact-reference';
import { checkPlan } from '../../tests/solver/plan-checker';
import { generateSizedYardJob } from './yard-jobs';
const useHighs = process.argv[2] !== 'nohighs';
if (useHighs) await prepareSolver();
const from = Number(process.argv[3] ?? 1),
  to = Number(process.argv[4] ?? 20);
let opt = 0,
  n = 0;
for (let seed = from; seed <= to; seed++) {
  const job = generateSizedYardJob(seed);
  const t0 = performance.now();
  const plan = solve(job);
  const ms = performance.now() - t0;
  const t1 = performance.now();
  const ref = await arcFlowCost(job, 60);
  const refMs = performance.now() - t1;
  const cost = Math.round(plan.totals.cost * 100);
  n++;
  if (ref !== null && cost === ref) opt++;
  const np = job.pieces.reduce((s, p) => s + p.quantity, 0);
  console.log(
    `#${seed} pieces=${np} lines=${job.pieces.length} off=${job.offcuts.length} ${ms.toFixed(0)}ms cost=${cost} ref=${ref} (${refMs.toFixed(0)}ms) proven=${plan.provenOptimal} lb=${Math.round(plan.lowerBound.cost * 100)} ${plan.lowerBound.method} err=${checkPlan(job, plan).length}`,
  );
}
console.log(`opt ${opt}/${n}`);
