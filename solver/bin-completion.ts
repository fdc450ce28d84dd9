// Bin completion towards a target board count (one board kind only). Every board may waste at most
// the budget left (target · capacity − weight still to place). At each step the piece with the
// fewest ways to complete a board (fail-first; a piece with none ends the branch at once) is
// boarded, trying its fullest completions first; remainders that failed are remembered.
// After R. E. Korf, "A new algorithm for optimal bin packing" (AAAI 2002), without its dominance
// rule, capped by a node count so the search path never depends on the clock.

export interface CompletionCaps {
  maxNodes: number;
  /** Completions tried per board, fullest first. */
  branching: number;
  /** Subset steps allowed when listing the completions of one piece. */
  listSteps: number;
  /** Fail-first choice (checking every piece) is used while the waste budget is at most this share of a board. */
  failFirstBudgetShare: number;
  /** Limited discrepancy search: passes allow 0, 1, … up to this many steps off the first choice. */
  maxDiscrepancies: number;
}

interface Completion {
  load: number;
  counts: number[];
}

export function packIntoTarget(
  weights: number[],
  demand: number[],
  capacity: number,
  target: number,
  caps: CompletionCaps,
  shouldStop: () => boolean,
  /** Optional LP values of boards, keyed by their item-type counts joined with commas: tried first among equally full completions. */
  guide?: Map<string, number>,
): number[][] | null {
  const counts = [...demand];
  const n = weights.length;
  let remaining = counts.reduce((s, c, i) => s + c * weights[i], 0);
  if (remaining > target * capacity) return null;
  const boards: number[][] = [];
  const failed = new Set<string>();
  let nodes = 0;
  let aborted = false;
  const pick = new Array<number>(n).fill(0);
  const suffix = new Array<number>(n + 1).fill(0);

  /** Maximal completions of a board holding `item` (already taken out of counts), fullest first. */
  const listCompletions = (item: number, minLoad: number, limit: number): Completion[] => {
    const room = capacity - weights[item];
    const out: Completion[] = [];
    for (let j = n - 1; j >= 0; j--) suffix[j] = suffix[j + 1] + counts[j] * weights[j];
    let smallest = Infinity;
    for (let j = n - 1; j >= 0; j--) {
      if (counts[j] > 0) {
        smallest = weights[j];
        break;
      }
    }
    let steps = 0;
    const canAddAny = (free: number): boolean => {
      if (free < smallest) return false;
      for (let j = n - 1; j >= 0 && weights[j] <= free; j--) if (counts[j] - pick[j] > 0) return true;
      return false;
    };
    const walk = (start: number, load: number): void => {
      const free = room - load;
      let lo = start;
      let hi = n;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (weights[mid] > free) lo = mid + 1;
        else hi = mid;
      }
      for (let j = lo; j < n; j++) {
        if (steps++ > caps.listSteps || out.length >= limit) return;
        if (load + suffix[j] - pick[j] * weights[j] < minLoad) break;
        if (counts[j] - pick[j] <= 0) continue;
        pick[j]++;
        walk(j, load + weights[j]);
        pick[j]--;
      }
      if (load >= minLoad && !canAddAny(free)) out.push({ load, counts: [...pick] });
    };
    walk(0, 0);
    out.sort((a, b) => b.load - a.load);
    return out;
  };

  const search = (left: number, discrepancies: number): boolean => {
    if (remaining === 0) return true;
    if (left <= 0) return false;
    if (++nodes > caps.maxNodes || (nodes % 16 === 0 && shouldStop())) {
      aborted = true;
      return false;
    }
    const key = `${discrepancies}|${left}|${counts.join(',')}`;
    if (failed.has(key)) return false;
    const budget = left * capacity - remaining;
    const room = (i: number) => capacity - weights[i];
    let item = counts.findIndex((c) => c > 0);
    let options: Completion[];
    if (budget <= caps.failFirstBudgetShare * capacity) {
      options = [];
      let fewest = Infinity;
      for (let i = 0; i < n; i++) {
        if (counts[i] === 0) continue;
        counts[i]--;
        const list = listCompletions(i, room(i) - budget, Math.min(fewest, caps.branching * 4));
        counts[i]++;
        if (list.length < fewest) {
          fewest = list.length;
          item = i;
          options = list;
          if (fewest === 0) break;
        }
      }
    } else {
      counts[item]--;
      options = listCompletions(item, room(item) - budget, caps.branching * 4);
      counts[item]++;
    }
    counts[item]--;
    if (guide) {
      const score = (o: Completion) => {
        o.counts[item]++;
        const v = guide.get(o.counts.join(',')) ?? 0;
        o.counts[item]--;
        return v;
      };
      const scored = options.map((o) => ({ o, v: score(o) }));
      scored.sort((a, b) => b.o.load - a.o.load || b.v - a.v);
      options = scored.map((x) => x.o);
    }
    const tries = options.slice(0, Math.min(caps.branching, discrepancies + 1));
    for (let k = 0; k < tries.length; k++) {
      const opt = tries[k];
      opt.counts.forEach((c, j) => (counts[j] -= c));
      const load = weights[item] + opt.load;
      remaining -= load;
      const items = [item];
      opt.counts.forEach((c, j) => {
        for (let k = 0; k < c; k++) items.push(j);
      });
      boards.push(items);
      if (search(left - 1, discrepancies - k)) return true;
      boards.pop();
      remaining += load;
      opt.counts.forEach((c, j) => (counts[j] += c));
      if (aborted) break;
    }
    counts[item]++;
    if (!aborted && failed.size < 200_000) failed.add(key);
    return false;
  };

  // maxDiscrepancies = Infinity: one plain depth-first pass.
  const passes = Number.isFinite(caps.maxDiscrepancies) ? caps.maxDiscrepancies + 1 : 1;
  for (let p = 0; p < passes && !aborted; p++) {
    if (search(target, Number.isFinite(caps.maxDiscrepancies) ? p : Infinity)) return boards;
  }
  return null;
}
