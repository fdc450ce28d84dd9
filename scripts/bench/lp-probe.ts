// npx tsx scripts/bench/lp-probe.ts [set] [limit]: the pattern LP alone (pivots, time, bound) on
// benchmark instances, cold and warm-started with the sequential-fill plan's patterns.
import { loadInstance, readOptima, toSolveInput } from './benchmark-files';
import { solvePatternLp, type Pattern } from '../../solver/column-generation';
import { sequentialFill } from '../../solver/greedy-fill';
import { buildModel } from '../../solver/model';

const set = process.argv[2] ?? 'hard28';
const limit = Number(process.argv[3] ?? 5);
for (const meta of readOptima()
  .filter((i) => i.set === set)
  .slice(0, limit)) {
  const inst = loadInstance(meta);
  const model = buildModel(toSolveInput(inst, 60_000));
  const items = model.items.map((it) => ({ weight: it.weight, demand: it.count }));
  const bins = model.bins.map((b) => ({ capacity: b.capacity, cost: b.cost, limit: b.limit }));
  const plan = sequentialFill(
    model,
    items.map((it) => it.demand),
    bins.map((b) => b.limit),
  );
  const warm: Pattern[] = plan.boards.map((b) => ({
    bin: b.bin,
    load: b.load,
    counts: model.items.map((_, i) => b.items.filter((t) => t === i).length),
  }));
  const line = [inst.name, `m=${items.length}`, `opt=${inst.optimum}`];
  for (const pool of [undefined, warm]) {
    const t0 = performance.now();
    const lp = solvePatternLp(items, bins, { maxPivots: 200_000, pool });
    line.push(
      `${pool ? 'warm' : 'cold'}: ${lp.pivots} pivots ${(performance.now() - t0).toFixed(0)} ms LP ${lp.value.toFixed(4)}`,
    );
  }
  console.log(line.join(' | '));
}
