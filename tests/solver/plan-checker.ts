// An independent checker for cutting plans. It reads only the public types of the solver and
// re-derives every rule from the job itself, so app tests can reuse it on any plan.
import type { SolveInput, SolvePlan } from '@/solver/types';

const money = (x: number) => Math.round(x * 1e6);

export function checkPlan(input: SolveInput, plan: SolvePlan): string[] {
  const errors: string[] = [];
  const { kerf, trim, minOffcut } = input;
  const stockById = new Map(input.stock.map((s) => [s.id, s]));
  const offcutById = new Map(input.offcuts.map((o) => [o.id, o]));
  const pieceById = new Map(input.pieces.map((p) => [p.id, p]));
  const seen = new Map<string, number>();
  const stockUse = new Map<string, number>();
  const offcutUse = new Map<string, number>();
  let cost = 0;
  let material = 0;

  plan.boards.forEach((board, n) => {
    let b = board;
    const where = `board ${n} (${b.sourceId})`;
    const stock = stockById.get(b.sourceId);
    const offcut = offcutById.get(b.sourceId);
    if (!stock && !offcut) return void errors.push(`${where}: unknown source`);
    const isStock = Boolean(stock);
    if (b.source !== (isStock ? 'stock' : 'offcut')) errors.push(`${where}: wrong source kind`);
    const length = stock?.length ?? offcut!.length;
    if (b.length !== length) errors.push(`${where}: length ${b.length} but source is ${length}`);
    // Plans stored before nominal pieces existed carry no cut lengths: those were the ordered lengths.
    b = { ...b, cutLengths: b.cutLengths ?? b.pieceLengths };
    const tolOf = (id: string) => pieceById.get(id)?.tolerance ?? 0;
    // DESIGN.md, full lengths and nominal pieces: only nominal pieces, or one piece as long as the
    // board (within its tolerance), means no trim.
    const onlyNominal = b.pieces.every((id) => tolOf(id) > 0);
    const single = b.pieces.length === 1 ? pieceById.get(b.pieces[0]) : undefined;
    const wholeBoard =
      single !== undefined && single.length - tolOf(single.id) <= length && length <= single.length;
    if ((b.fullLength ?? wholeBoard) !== wholeBoard)
      errors.push(`${where}: fullLength ${b.fullLength}, expected ${wholeBoard}`);
    const boardTrim = isStock && !onlyNominal && !wholeBoard ? trim : 0;
    if (b.trim !== boardTrim) errors.push(`${where}: trim ${b.trim}, expected ${boardTrim}`);
    if (isStock) stockUse.set(b.sourceId, (stockUse.get(b.sourceId) ?? 0) + 1);
    else offcutUse.set(b.sourceId, (offcutUse.get(b.sourceId) ?? 0) + 1);
    if (b.pieces.length === 0) errors.push(`${where}: no pieces`);
    if (b.pieces.length !== b.pieceLengths.length)
      errors.push(`${where}: pieces and lengths differ in count`);
    if (b.cutLengths.length !== b.pieces.length)
      errors.push(`${where}: cut lengths and pieces differ in count`);
    b.pieces.forEach((id, k) => {
      seen.set(id, (seen.get(id) ?? 0) + 1);
      const p = pieceById.get(id);
      if (!p) errors.push(`${where}: unknown piece ${id}`);
      else {
        if (p.length !== b.pieceLengths[k])
          errors.push(`${where}: piece ${id} length ${b.pieceLengths[k]} != ${p.length}`);
        const cut = b.cutLengths[k];
        if (!(cut >= p.length - (p.tolerance ?? 0) && cut <= p.length))
          errors.push(
            `${where}: piece ${id} cut at ${cut}, allowed ${p.length - (p.tolerance ?? 0)}–${p.length}`,
          );
      }
    });
    const usable = length - boardTrim - (boardTrim > 0 ? kerf : 0);
    const sumWithKerf = b.cutLengths.reduce((s, l) => s + l + kerf, 0);
    if (wholeBoard) {
      if (b.cutLengths[0] !== length || b.marks.length > 0 || b.kerfLoss !== 0 || b.remainder !== 0)
        errors.push(`${where}: a full-length board is sold whole, without a cut`);
    } else if (sumWithKerf > usable + kerf)
      errors.push(`${where}: over-full (${sumWithKerf} > ${usable + kerf})`);
    // Nominal pieces are shortened only when their ordered lengths do not fit.
    const orderedFit = b.pieceLengths.reduce((s, l) => s + l + kerf, 0) <= usable + kerf;
    if (orderedFit && b.cutLengths.some((c, k) => c !== b.pieceLengths[k]))
      errors.push(`${where}: pieces cut short although their ordered lengths fit`);
    // Marks: each cut starts where the previous piece ends; the last cut may be absent only at the very end.
    let pos = 0;
    const expected: number[] = [];
    b.cutLengths.forEach((l) => {
      pos += l;
      if (pos < usable) expected.push(pos);
      pos += kerf;
    });
    if (JSON.stringify(expected) !== JSON.stringify(b.marks))
      errors.push(`${where}: marks ${b.marks} expected ${expected}`);
    const used = b.cutLengths.reduce((s, l) => s + l, 0) + b.cutLengths.length * kerf;
    const remainder = Math.max(0, usable - used);
    if (b.remainder !== remainder) errors.push(`${where}: remainder ${b.remainder} expected ${remainder}`);
    const kept = remainder > 0 && remainder >= minOffcut;
    if (b.keepRemainder !== kept) errors.push(`${where}: keepRemainder wrong`);
    const scrap = boardTrim + (kept ? 0 : remainder);
    if (b.scrap !== scrap) errors.push(`${where}: scrap ${b.scrap} expected ${scrap}`);
    const pieceSum = b.cutLengths.reduce((s, l) => s + l, 0);
    if (pieceSum + b.kerfLoss + b.scrap + (kept ? remainder : 0) !== length)
      errors.push(`${where}: material does not add up`);
    const boardCost = isStock ? (stock!.cost ?? length / 1000) : 0;
    if (money(b.cost) !== money(boardCost)) errors.push(`${where}: cost ${b.cost} expected ${boardCost}`);
    cost += boardCost;
    material += length;
  });

  for (const [id, n] of offcutUse) if (n > 1) errors.push(`offcut ${id} used ${n} times`);
  for (const [id, n] of stockUse) {
    const cap = stockById.get(id)!.available;
    if (cap !== null && cap !== undefined && n > cap) errors.push(`stock ${id} used ${n} times, cap ${cap}`);
  }

  const capacityOf = (len: number, isStock: boolean) => (isStock ? len - trim - (trim > 0 ? kerf : 0) : len);
  const sources = [
    ...input.stock
      .filter((s) => s.available !== 0)
      .map((s) => ({ id: s.id, length: s.length, usable: capacityOf(s.length, true), stock: s })),
    ...input.offcuts.map((o) => ({ id: o.id, length: o.length, usable: o.length, stock: null })),
  ];
  // A piece alone on a board: untrimmed when nominal or as long as the board, else trimmed.
  const fitsAlone = (s: (typeof sources)[number], p: SolveInput['pieces'][number]) => {
    const shortest = p.length - (p.tolerance ?? 0);
    const untrimmed = (p.tolerance ?? 0) > 0 || s.length <= p.length;
    return shortest <= (untrimmed ? s.length : s.usable);
  };
  for (const u of plan.unplaced) {
    seen.set(u.id, (seen.get(u.id) ?? 0) + 1);
    const p = pieceById.get(u.id);
    if (!p) {
      errors.push(`unplaced: unknown piece ${u.id}`);
      continue;
    }
    const takes = (s: (typeof sources)[number]) => fitsAlone(s, p);
    const fitsSomewhere = sources.some(takes);
    if (u.reason === 'longer-than-every-source' && fitsSomewhere)
      errors.push(`unplaced ${u.id}: fits a source`);
    if (u.reason === 'not-enough-stock') {
      if (!fitsSomewhere) errors.push(`unplaced ${u.id}: reason should be longer-than-every-source`);
      const idle = sources.find((s) => {
        if (!takes(s)) return false;
        if (!s.stock) return !offcutUse.has(s.id);
        const cap = s.stock.available;
        return cap === null || cap === undefined || (stockUse.get(s.id) ?? 0) < cap;
      });
      if (idle) errors.push(`unplaced ${u.id}: ${idle.id} is unused and would take it`);
    }
  }
  for (const p of input.pieces) {
    const n = seen.get(p.id) ?? 0;
    if (n !== p.quantity) errors.push(`piece ${p.id}: accounted ${n} times, quantity ${p.quantity}`);
  }

  const t = plan.totals;
  if (t.boards !== plan.boards.length) errors.push('totals.boards wrong');
  if (money(t.cost) !== money(cost)) errors.push(`totals.cost ${t.cost} expected ${cost}`);
  if (t.materialLength !== material) errors.push('totals.materialLength wrong');
  if (plan.lowerBound.boards > plan.boards.length)
    errors.push(`boards ${plan.boards.length} below lower bound ${plan.lowerBound.boards}`);
  if (money(plan.lowerBound.cost) > money(cost) + 1)
    errors.push(`cost ${cost} below lower bound ${plan.lowerBound.cost}`);
  return errors;
}
