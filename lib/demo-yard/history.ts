// A few months of invented yard history so the owner's reports have figures: an opening count,
// deliveries, past jobs planned by the real solver and cut at the saw, offcuts made, used and cleared.
// Stock on hand ends equal to the sum of each stock length's movements.
// Rows are built in memory with ids taken after the current maximum and inserted in bulk (seeding stays fast).
import { eq, sql } from 'drizzle-orm';
import type { Tx } from '@/db/types';
import {
  offcutSourceId,
  pieceIdFor,
  stockSourceId,
  type PlanSection,
  type PlanSettings,
} from '@/lib/plans/plan-shapes';
import { solve, type SolveInput } from '@/solver';
import * as schema from '@/db/schema';
import { rackLocations, seededRandom } from './demo-yard';
import { pastCustomers, pastJobKinds } from './history-jobs';
import { summarisePlan } from '@/lib/plans/summarise-plan';
import { formatOffcutTag } from '@/lib/offcuts/offcut-tag';
import { boardPiecesOf, sourceOf } from './history-plan';

type SeedTx = Tx;
type Offcut = typeof schema.offcuts.$inferInsert & { id: number; createdAt: Date };

const DAY_MS = 86_400_000;
const HOUR_MS = 3_600_000;
const HISTORY_DAYS = 112;
const SETTINGS: PlanSettings = {
  kerfMm: 3,
  trimMm: 15,
  minOffcutMm: 300,
  useOffcuts: true,
  stockLengthIds: null,
  timeLimitMs: 30,
};
const REORDER_BELOW = 8;
const DELIVERY_SIZE = 20;
const CLEAR_REASON = 'Rack clear-out: short and old';

// Map.groupBy arrives in Node 21; the yard runs on Node 20.
function groupBy<T, K>(list: T[], key: (item: T) => K): Map<K, T[]> {
  const groups = new Map<K, T[]>();
  for (const item of list) groups.set(key(item), [...(groups.get(key(item)) ?? []), item]);
  return groups;
}

async function maxId(tx: SeedTx, table: string): Promise<number> {
  const [row] = await tx.select({ n: sql<number>`coalesce(max(id), 0)::int` }).from(sql.raw(table));
  return row.n;
}

/**
 * When the past jobs were planned and cut: the yard's week, as a small yard works it. Monday to
 * Friday most days bring a cut job and some two (more on a Friday, before weekend work); Saturday is
 * a morning, with a job some weeks; Sunday the yard is shut. Invented, like all demo data.
 */
function yardWeek(start: Date, days: number, random: () => number) {
  const jobs: { plannedAt: Date; doneAt: Date }[] = [];
  for (let d = 0; d < days - 1; d++) {
    const day = new Date(start.getTime() + d * DAY_MS);
    day.setUTCHours(0, 0, 0, 0);
    const weekday = day.getUTCDay();
    if (weekday === 0) continue;
    const count =
      weekday === 6
        ? Number(random() < 0.5)
        : Number(random() < 0.8) + Number(random() < (weekday === 5 ? 0.5 : 0.2));
    // Saturday 8–12; weekdays 8–17: taken in the morning or after lunch, cut within a few hours.
    const [open, hours] = weekday === 6 ? [8, 2] : [8, 6];
    for (let k = 0; k < count; k++) {
      const at = open + (k * hours) / Math.max(count, 1) + random() * (hours / 2);
      const plannedAt = new Date(day.getTime() + Math.round(at * 60) * 60_000);
      const doneAt = new Date(plannedAt.getTime() + (weekday === 6 ? 1.5 : 2 + random() * 2) * HOUR_MS);
      jobs.push({ plannedAt, doneAt });
    }
  }
  return jobs;
}

export async function seedHistory(
  tx: SeedTx,
  { now, userIds }: { now: Date; userIds: { owner: number; hand: number; saw: number } },
) {
  const random = seededRandom(7731);
  const pick = <T>(list: T[]) => list[Math.floor(random() * list.length)];
  const between = (min: number, max: number) => min + Math.floor(random() * (max - min + 1));
  const start = new Date(now.getTime() - HISTORY_DAYS * DAY_MS);

  const sections = await tx.select().from(schema.sections);
  const sectionByCode = new Map(sections.map((s) => [s.code, s]));
  const lengths = await tx.select().from(schema.stockLengths);
  const lengthById = new Map(lengths.map((l) => [l.id, l]));
  const lengthsBySection = groupBy(lengths, (l) => l.sectionId);
  const pencePerMetre = new Map(
    [...lengthsBySection].map(([id, ls]) => [
      id,
      Math.min(...ls.map((l) => (1000 * l.pricePence) / l.lengthMm)),
    ]),
  );
  const valueOf = (sectionId: number, lengthMm: number) =>
    Math.round((lengthMm * pencePerMetre.get(sectionId)!) / 1000);

  const next = {
    job: await maxId(tx, 'jobs'),
    item: await maxId(tx, 'job_items'),
    plan: await maxId(tx, 'plans'),
    offcut: await maxId(tx, 'offcuts'),
  };
  const rows = {
    jobs: [] as (typeof schema.jobs.$inferInsert)[],
    items: [] as (typeof schema.jobItems.$inferInsert)[],
    plans: [] as (typeof schema.plans.$inferInsert)[],
    boards: [] as (typeof schema.planBoards.$inferInsert)[],
    offcuts: [] as Offcut[],
    movements: [] as (typeof schema.stockMovements.$inferInsert)[],
  };

  // Counted lengths start from an opening stocktake; null stays unlimited.
  const onHand = new Map(lengths.filter((l) => l.onHand !== null).map((l) => [l.id, 18 + between(0, 24)]));
  for (const [id, count] of onHand) {
    const l = lengthById.get(id)!;
    rows.movements.push({
      at: new Date(start.getTime() - 2 * DAY_MS),
      kind: 'stocktake',
      userId: userIds.owner,
      sectionId: l.sectionId,
      stockLengthId: id,
      quantityDelta: count,
      lengthMm: l.lengthMm,
      valuePence: count * l.pricePence,
      reason: 'Opening count',
    });
  }

  const rack: Offcut[] = (
    await tx.select().from(schema.offcuts).where(eq(schema.offcuts.status, 'available'))
  ).map((o) => ({ ...o }));
  const preexisting = new Set(rack.map((o) => o.id));

  const workingDays = yardWeek(start, HISTORY_DAYS, random);
  for (let j = 0; j < workingDays.length; j++) {
    const { plannedAt, doneAt } = workingDays[j];
    const kind = pick(pastJobKinds);

    // A delivery first thing that morning tops up whatever runs low.
    for (const [id, count] of onHand) {
      if (count >= REORDER_BELOW) continue;
      const l = lengthById.get(id)!;
      onHand.set(id, count + DELIVERY_SIZE);
      rows.movements.push({
        at: new Date(new Date(plannedAt).setUTCHours(7, 30, 0, 0)),
        kind: 'receipt',
        userId: userIds.hand,
        sectionId: l.sectionId,
        stockLengthId: id,
        quantityDelta: DELIVERY_SIZE,
        lengthMm: l.lengthMm,
        valuePence: DELIVERY_SIZE * l.pricePence,
        reason: `Delivery note DN-${4100 + j}`,
      });
    }

    const jobId = ++next.job;
    // Numbered up to the open jobs (J-1001 onwards), oldest first.
    const reference = `J-${String(1001 - workingDays.length + j).padStart(4, '0')}`;
    rows.jobs.push({
      id: jobId,
      reference,
      customerName: pick(pastCustomers),
      dueDate: doneAt.toISOString().slice(0, 10),
      status: 'done',
      notes: kind.notes,
      createdBy: userIds.hand,
      createdAt: plannedAt,
      updatedAt: doneAt,
    });
    const items = kind.lines.map((line, position) => ({
      id: ++next.item,
      jobId,
      sectionId: sectionByCode.get(line.code)!.id,
      lengthMm: pick(line.lengths),
      quantity: between(line.min, line.max),
      label: line.label,
      position,
    }));
    rows.items.push(...items);
    const labels = new Map(items.map((i) => [i.id, i.label]));

    const planId = ++next.plan;
    const planSections: PlanSection[] = [];
    for (const [sectionId, sectionItems] of groupBy(items, (i) => i.sectionId)) {
      const offcutsHere = rack
        .filter((o) => o.sectionId === sectionId && o.status === 'available' && o.createdAt < plannedAt)
        .slice(0, 16);
      const input: SolveInput = {
        kerf: SETTINGS.kerfMm,
        trim: SETTINGS.trimMm,
        minOffcut: SETTINGS.minOffcutMm,
        timeLimitMs: SETTINGS.timeLimitMs,
        stock: lengthsBySection.get(sectionId)!.map((l) => ({
          id: stockSourceId(l.id),
          length: l.lengthMm,
          cost: l.pricePence / 100,
          available: onHand.get(l.id) ?? null,
        })),
        offcuts: offcutsHere.map((o) => ({ id: offcutSourceId(o.id), length: o.lengthMm })),
        pieces: sectionItems.map((i) => ({ id: pieceIdFor(i.id), length: i.lengthMm, quantity: i.quantity })),
      };
      const output = solve(input);
      planSections.push({
        sectionId,
        sectionName: sections.find((s) => s.id === sectionId)!.name,
        input,
        output,
      });

      for (const board of output.boards) {
        const source = sourceOf(board);
        if (source.kind === 'stock' && onHand.has(source.id))
          onHand.set(source.id, onHand.get(source.id)! - 1);
        if (source.kind === 'offcut') {
          const used = rack.find((o) => o.id === source.id)!;
          used.status = 'used';
          used.updatedAt = doneAt;
        }
        let newOffcutId: number | null = null;
        if (board.keepRemainder) {
          newOffcutId = ++next.offcut;
          const made: Offcut = {
            id: newOffcutId,
            // The same tag format as at the saw, numbered on from the opening rack.
            tag: formatOffcutTag(newOffcutId),
            sectionId,
            lengthMm: board.remainder,
            location: board.remainder < 600 ? 'Short bin' : pick(rackLocations.slice(0, 7)),
            status: 'available',
            origin: `Job ${reference}`,
            originPlanId: planId,
            createdAt: doneAt,
            updatedAt: doneAt,
          };
          rows.offcuts.push(made);
          rack.push(made);
        }
        rows.movements.push({
          at: doneAt,
          kind: source.kind === 'stock' ? 'stock_cut' : 'offcut_used',
          userId: userIds.saw,
          sectionId,
          stockLengthId: source.kind === 'stock' ? source.id : null,
          offcutId: source.kind === 'offcut' ? source.id : null,
          quantityDelta: source.kind === 'stock' ? -1 : 0,
          lengthMm: board.length,
          valuePence:
            source.kind === 'stock' ? Math.round(board.cost * 100) : valueOf(sectionId, board.length),
          planId,
          jobId,
        });
        if (newOffcutId) {
          rows.movements.push({
            at: doneAt,
            kind: 'offcut_made',
            userId: userIds.saw,
            sectionId,
            offcutId: newOffcutId,
            lengthMm: board.remainder,
            valuePence: valueOf(sectionId, board.remainder),
            planId,
            jobId,
          });
        }
        rows.boards.push({
          planId,
          boardNo: rows.boards.filter((b) => b.planId === planId).length + 1,
          sectionId,
          source: source.kind,
          stockLengthId: source.kind === 'stock' ? source.id : null,
          offcutId: source.kind === 'offcut' ? source.id : null,
          lengthMm: board.length,
          trimMm: board.trim,
          pieces: boardPiecesOf(board, SETTINGS.kerfMm, labels),
          remainderMm: board.remainder,
          keepRemainder: board.keepRemainder,
          status: 'done',
          doneAt,
          doneBy: userIds.saw,
          newOffcutId,
        });
      }
    }
    const totals = summarisePlan(planSections);
    rows.plans.push({
      id: planId,
      jobId,
      status: 'done',
      settings: SETTINGS,
      sections: planSections,
      totals,
      pricePence: totals.stockCostPence + totals.cuts * 25,
      createdBy: userIds.hand,
      createdAt: plannedAt,
      releasedAt: plannedAt,
    });
  }

  // A clear-out three weeks ago: short pieces that sat on the rack for over sixty days.
  const clearAt = new Date(now.getTime() - 21 * DAY_MS);
  for (const o of rack) {
    if (
      o.status !== 'available' ||
      o.lengthMm >= 600 ||
      o.createdAt.getTime() > clearAt.getTime() - 60 * DAY_MS
    )
      continue;
    Object.assign(o, { status: 'scrapped', scrapReason: CLEAR_REASON, updatedAt: clearAt });
    rows.movements.push({
      at: clearAt,
      kind: 'offcut_scrapped',
      userId: userIds.owner,
      sectionId: o.sectionId,
      offcutId: o.id,
      lengthMm: o.lengthMm,
      valuePence: valueOf(o.sectionId, o.lengthMm),
      reason: CLEAR_REASON,
    });
  }

  await tx.insert(schema.jobs).values(rows.jobs);
  await tx.insert(schema.jobItems).values(rows.items);
  await tx.insert(schema.plans).values(rows.plans);
  if (rows.offcuts.length > 0) await tx.insert(schema.offcuts).values(rows.offcuts);
  await tx.insert(schema.planBoards).values(rows.boards);
  for (let i = 0; i < rows.movements.length; i += 500)
    await tx.insert(schema.stockMovements).values(rows.movements.slice(i, i + 500));
  for (const o of rack.filter((x) => preexisting.has(x.id) && x.status !== 'available')) {
    await tx
      .update(schema.offcuts)
      .set({ status: o.status, scrapReason: o.scrapReason, updatedAt: o.updatedAt })
      .where(eq(schema.offcuts.id, o.id));
  }
  for (const [table, n] of [
    ['jobs', next.job],
    ['job_items', next.item],
    ['plans', next.plan],
    ['offcuts', next.offcut],
  ] as const) {
    if (n > 0) await tx.execute(sql.raw(`select setval(pg_get_serial_sequence('${table}', 'id'), ${n})`));
  }
  for (const [id, count] of onHand)
    await tx.update(schema.stockLengths).set({ onHand: count }).where(eq(schema.stockLengths.id, id));
}
