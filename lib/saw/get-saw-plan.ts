import 'server-only';
import { asc, eq, inArray } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, offcuts, planBoards, plans, sections, stockLengths } from '@/db/schema';
import { notFound } from '@/lib/errors';
import type { BoardPiece, PlanSettings } from '@/lib/plans/plan-shapes';
import { getYardSettings } from '@/lib/yard/get-yard-settings';
import { planProgress } from './settle-plan-status';

/** A plan as the saw station shows it: each board with what to fetch and where it is. */
export async function getSawPlan({ planId }: { planId: number }) {
  const db = await getDb();
  const [plan] = await db.select().from(plans).where(eq(plans.id, planId));
  // The saw sees plans the office has released (and finished ones, to show them complete);
  // drafts and superseded plans stay in the office.
  if (!plan || (plan.status !== 'released' && plan.status !== 'done')) throw notFound('That plan');
  const [job] = await db.select().from(jobs).where(eq(jobs.id, plan.jobId));
  const boards = await db
    .select()
    .from(planBoards)
    .where(eq(planBoards.planId, planId))
    .orderBy(asc(planBoards.boardNo));
  const sectionIds = [...new Set(boards.map((b) => b.sectionId))];
  const offcutIds = boards
    .flatMap((b) => [b.offcutId, b.newOffcutId])
    .filter((id): id is number => id !== null);
  const [sectionRows, offcutRows, stockRows, yard] = await Promise.all([
    sectionIds.length ? db.select().from(sections).where(inArray(sections.id, sectionIds)) : [],
    offcutIds.length ? db.select().from(offcuts).where(inArray(offcuts.id, offcutIds)) : [],
    sectionIds.length
      ? db.select().from(stockLengths).where(inArray(stockLengths.sectionId, sectionIds))
      : [],
    getYardSettings(db),
  ]);
  const offcutBrief = (id: number | null) => {
    const o = offcutRows.find((x) => x.id === id);
    return o ? { id: o.id, tag: o.tag, location: o.location, lengthMm: o.lengthMm, status: o.status } : null;
  };
  const settings = plan.settings as PlanSettings;
  return {
    id: plan.id,
    status: plan.status,
    kerfMm: settings.kerfMm,
    displayUnit: yard.displayUnit,
    job: {
      id: job.id,
      reference: job.reference,
      customerName: job.customerName,
      dueDate: job.dueDate,
      status: job.status,
      officeFlag: job.officeFlag,
    },
    progress: await planProgress(db, planId),
    boards: boards.map((b) => {
      const section = sectionRows.find((s) => s.id === b.sectionId)!;
      return {
        boardNo: b.boardNo,
        section: {
          id: section.id,
          name: section.name,
          treated: /treat/i.test(section.treatment) && !/untreated/i.test(section.treatment),
        },
        source: b.source,
        stockLengthMm: stockRows.find((s) => s.id === b.stockLengthId)?.lengthMm ?? null,
        offcut: offcutBrief(b.offcutId),
        lengthMm: b.lengthMm,
        trimMm: b.trimMm,
        pieces: b.pieces as BoardPiece[],
        remainderMm: b.remainderMm,
        keepRemainder: b.keepRemainder,
        fullLength: b.fullLength,
        status: b.status,
        doneAt: b.doneAt,
        defectReason: b.defectReason,
        newOffcut: offcutBrief(b.newOffcutId),
      };
    }),
  };
}
export type SawPlan = Awaited<ReturnType<typeof getSawPlan>>;
export type SawBoard = SawPlan['boards'][number];
