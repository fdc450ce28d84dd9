import 'server-only';
import { and, desc, eq, gte, inArray, isNotNull, lt, lte, notInArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import {
  jobs,
  offcuts,
  planBoards,
  plans,
  sections,
  stockLengths,
  stockMovements,
  yardSettings,
} from '@/db/schema';

const DAY_MS = 86_400_000;
/** How long a "cut though the count showed none" stays flagged on the overview. */
const FLAG_DAYS = 14;

/** What needs doing today, for the owner's overview; each count leads to the page behind it. */
export async function getYardOverview(now = new Date()) {
  const db = await getDb();
  const today = now.toISOString().slice(0, 10);
  const open = notInArray(jobs.status, ['done', 'cancelled']);
  const [settings] = await db.select({ days: yardSettings.clearOffcutsAfterDays }).from(yardSettings);
  const clearBefore = new Date(now.getTime() - (settings?.days ?? 90) * DAY_MS);
  const [[due], [atSaw], shortLengths, [toClear], [rack], jobFlags, countedShort] = await Promise.all([
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(jobs)
      .where(and(open, lte(jobs.dueDate, today))),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(jobs)
      .where(inArray(jobs.status, ['released', 'cutting'])),
    // Stock lengths the released plans still need more boards of than the count shows.
    db
      .select({ id: stockLengths.id })
      .from(planBoards)
      .innerJoin(plans, eq(plans.id, planBoards.planId))
      .innerJoin(stockLengths, eq(stockLengths.id, planBoards.stockLengthId))
      .where(
        and(eq(plans.status, 'released'), eq(planBoards.status, 'pending'), isNotNull(stockLengths.onHand)),
      )
      .groupBy(stockLengths.id, stockLengths.onHand)
      .having(sql`count(*) > ${stockLengths.onHand}`),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(offcuts)
      .where(and(eq(offcuts.status, 'available'), lt(offcuts.createdAt, clearBefore))),
    db
      .select({ n: sql<number>`count(*)::int`, mm: sql<number>`coalesce(sum(${offcuts.lengthMm}), 0)::int` })
      .from(offcuts)
      .where(eq(offcuts.status, 'available')),
    db
      .select({ id: jobs.id, reference: jobs.reference, text: jobs.officeFlag })
      .from(jobs)
      .where(and(open, isNotNull(jobs.officeFlag))),
    db
      .select({
        id: stockMovements.id,
        at: stockMovements.at,
        sectionName: sections.name,
        lengthMm: stockMovements.lengthMm,
      })
      .from(stockMovements)
      .innerJoin(sections, eq(sections.id, stockMovements.sectionId))
      .where(
        and(
          eq(stockMovements.kind, 'counted_short'),
          gte(stockMovements.at, new Date(now.getTime() - FLAG_DAYS * DAY_MS)),
        ),
      )
      .orderBy(desc(stockMovements.at)),
  ]);
  const flags = [
    ...jobFlags.map((f) => ({
      key: `job-${f.id}`,
      text: `${f.reference}: ${f.text}`,
      href: `/jobs/${f.id}`,
    })),
    ...countedShort.map((m) => ({
      key: `count-${m.id}`,
      text: `A ${m.lengthMm} mm ${m.sectionName} was cut at the saw though the count showed none: recount it.`,
      href: '/stock',
    })),
  ];
  return {
    dueToday: due.n,
    atSaw: atSaw.n,
    shortStock: shortLengths.length,
    offcutsToClear: toClear.n,
    clearAfterDays: settings?.days ?? 90,
    rackOffcuts: rack.n,
    rackMetres: rack.mm / 1000,
    flags,
  };
}
