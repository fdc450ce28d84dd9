import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobItems, type NewJobItem } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';
import { resolveTolerance } from '@/lib/nominal/tolerance';
import { formatMillimetres, shortPieceMessage } from '@/lib/units';
import type { JobItemFields } from '@/lib/validations/jobs';
import { openJobForItemEdits } from './open-job-for-item-edits';
import { getSectionLimits } from './section-limits';

type ItemFields = Partial<JobItemFields>;

type SectionLimits = Awaited<ReturnType<typeof getSectionLimits>>;

function checkItemFits(
  limits: SectionLimits,
  sectionId: number,
  lengthMm: number,
  /** The length as typed; false when the length is unchanged (an old short piece may keep its length). */
  lengthText: string | undefined | false,
  toleranceMm: number,
) {
  const short =
    lengthText === false
      ? null
      : shortPieceMessage({ mm: lengthMm, minSafeMm: limits.minSafePieceMm, typed: lengthText });
  if (short) throw new AppError('invalid', short, { issues: [{ path: 'length', message: short }] });
  const section = limits.sections.find((s) => s.id === sectionId);
  if (!section)
    throw new AppError('invalid', 'That section is not sold here.', {
      issues: [{ path: 'sectionId', message: 'Choose a section the yard sells.' }],
    });
  const longest = limits.longestMm(sectionId);
  if (toleranceMm >= lengthMm)
    throw new AppError('invalid', 'The tolerance must be shorter than the piece.', {
      issues: [{ path: 'toleranceMm', message: 'The tolerance must be shorter than the piece.' }],
    });
  if (lengthMm > longest) {
    throw new AppError(
      'invalid',
      `Length ${formatMillimetres(lengthMm)} mm is longer than any stock length or offcut of ${section.name} (longest ${formatMillimetres(longest)} mm).`,
      {
        issues: [
          {
            path: 'length',
            message: `Longer than the longest ${section.name} (${formatMillimetres(longest)} mm).`,
          },
        ],
      },
    );
  }
}

/** Adds one line item at the end of the job's list. */
export async function addJobItem({
  jobId,
  item,
}: {
  jobId: number;
  item: Omit<JobItemFields, 'lengthText'> & { lengthText?: string };
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    await openJobForItemEdits(tx, jobId);
    const limits = await getSectionLimits(tx);
    const toleranceMm = resolveTolerance({
      toleranceMm: item.toleranceMm,
      nominal: item.nominal,
      nominalDefaultMm: limits.nominalToleranceMm(item.sectionId),
    });
    checkItemFits(limits, item.sectionId, item.length, item.lengthText, toleranceMm);
    const [{ next }] = await tx
      .select({ next: sql<number>`coalesce(max(${jobItems.position}), -1)::int + 1` })
      .from(jobItems)
      .where(eq(jobItems.jobId, jobId));
    const [row] = await tx
      .insert(jobItems)
      .values({
        jobId,
        sectionId: item.sectionId,
        lengthMm: item.length,
        quantity: item.quantity,
        label: item.label,
        note: item.note,
        toleranceMm,
        position: next,
      })
      .returning();
    return row;
  });
}

/** Changes fields of one line item. */
export async function updateJobItem({
  jobId,
  itemId,
  changes,
}: {
  jobId: number;
  itemId: number;
  changes: ItemFields;
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    await openJobForItemEdits(tx, jobId);
    const [item] = await tx
      .select()
      .from(jobItems)
      .where(and(eq(jobItems.id, itemId), eq(jobItems.jobId, jobId)));
    if (!item) throw notFound('That line item');
    const set: Partial<NewJobItem> = {};
    if (changes.sectionId !== undefined) set.sectionId = changes.sectionId;
    if (changes.length !== undefined) set.lengthMm = changes.length;
    if (changes.quantity !== undefined) set.quantity = changes.quantity;
    if (changes.label !== undefined) set.label = changes.label;
    if (changes.note !== undefined) set.note = changes.note;
    const sectionId = set.sectionId ?? item.sectionId;
    const limits = await getSectionLimits(tx);
    if (changes.toleranceMm !== undefined || changes.nominal !== undefined) {
      set.toleranceMm = resolveTolerance({
        toleranceMm: changes.toleranceMm,
        nominal: changes.nominal ?? item.toleranceMm > 0,
        nominalDefaultMm: limits.nominalToleranceMm(sectionId),
      });
    }
    checkItemFits(
      limits,
      sectionId,
      set.lengthMm ?? item.lengthMm,
      changes.length !== undefined ? changes.lengthText : false,
      set.toleranceMm ?? item.toleranceMm,
    );
    const [row] = await tx.update(jobItems).set(set).where(eq(jobItems.id, itemId)).returning();
    return row;
  });
}

/** Removes one line item. */
export async function deleteJobItem({ jobId, itemId }: { jobId: number; itemId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    await openJobForItemEdits(tx, jobId);
    const deleted = await tx
      .delete(jobItems)
      .where(and(eq(jobItems.id, itemId), eq(jobItems.jobId, jobId)))
      .returning({ id: jobItems.id });
    if (!deleted.length) throw notFound('That line item');
    return { deleted: itemId };
  });
}
