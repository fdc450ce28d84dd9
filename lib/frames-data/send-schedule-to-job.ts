import 'server-only';
import { and, eq, inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobItems, jobs, plans } from '@/db/schema';
import { resolveJobCustomer } from '@/lib/customers/resolve-job-customer';
import { AppError, notFound } from '@/lib/errors';
import { nextJobReference } from '@/lib/jobs/next-job-reference';
import { getSectionLimits } from '@/lib/jobs/section-limits';
import { resolveTolerance, usableTolerance } from '@/lib/nominal/tolerance';
import { generateFrameItems } from '@/lib/frames';
import type { SendScheduleToJobBody } from '@/lib/validations/frames';
import { assertKnownSections } from './assert-known-sections';
import { toFrameJobLines } from './frame-line-items';
import { getFrameScheduleById } from './frame-schedules';
import { getYardFrameSections } from './get-yard-frame-sections';

const OPEN_STATUSES = ['draft', 'planned'] as const;

/**
 * Adds a schedule's cut list, summed by section, to a draft or planned job or to a new job, in one
 * transaction; the job remembers the schedule, and each line its piece marks. Sent to a job that
 * already holds the schedule's lines, it asks (409) unless told to replace them or add another set.
 * A planned job goes back to draft: its plan no longer covers its items.
 */
export async function sendScheduleToJob({
  scheduleId,
  body,
  userId,
}: {
  scheduleId: number;
  body: SendScheduleToJobBody;
  userId: number;
}) {
  const db = await getDb();
  const schedule = await getFrameScheduleById({ id: scheduleId, db });
  const { dimensions, context } = await getYardFrameSections({ db });
  assertKnownSections(schedule.panels, dimensions);
  const lines = toFrameJobLines(generateFrameItems(schedule.panels, context).items);
  if (lines.length === 0)
    throw new AppError('invalid', 'This schedule has no pieces yet. Add a panel first.');

  return db.transaction(async (tx) => {
    let jobId: number;
    if (body.jobId !== undefined) {
      const [job] = await tx
        .select({ id: jobs.id, status: jobs.status, reference: jobs.reference })
        .from(jobs)
        .where(eq(jobs.id, body.jobId));
      if (!job) throw notFound('That job');
      if (!(OPEN_STATUSES as readonly string[]).includes(job.status))
        throw new AppError(
          'conflict',
          `Job ${job.reference} is ${job.status}; only draft or planned jobs take new pieces.`,
        );
      jobId = job.id;
      const [{ sent }] = await tx
        .select({ sent: sql<number>`count(*)::int` })
        .from(jobItems)
        .where(and(eq(jobItems.jobId, jobId), eq(jobItems.frameScheduleId, scheduleId)));
      if (sent > 0 && body.ifAlreadySent === undefined)
        throw new AppError(
          'conflict',
          `Job ${job.reference} already holds this schedule's pieces (${sent} line${sent === 1 ? '' : 's'}). Replace them with this set, or add a second set?`,
          { alreadySent: sent },
        );
      if (sent > 0 && body.ifAlreadySent === 'replace')
        await tx
          .delete(jobItems)
          .where(and(eq(jobItems.jobId, jobId), eq(jobItems.frameScheduleId, scheduleId)));
      if (job.status === 'planned')
        await tx
          .update(plans)
          .set({ status: 'superseded' })
          .where(and(eq(plans.jobId, jobId), inArray(plans.status, ['planned'])));
      await tx
        .update(jobs)
        .set({ frameScheduleId: scheduleId, status: 'draft', updatedAt: new Date() })
        .where(eq(jobs.id, jobId));
    } else {
      const newJob = body.newJob!; // the body schema allows exactly one of jobId and newJob
      const reference = newJob.reference || (await nextJobReference(tx));
      const [taken] = await tx.select({ id: jobs.id }).from(jobs).where(eq(jobs.reference, reference));
      if (taken)
        throw new AppError('conflict', `There is already a job ${reference}; choose another reference.`);
      const customer = await resolveJobCustomer(tx, {
        customerId: newJob.customerId,
        newCustomer: newJob.newCustomer,
        name: newJob.customerName,
        email: newJob.customerEmail,
      });
      const [job] = await tx
        .insert(jobs)
        .values({
          reference,
          customerId: customer.id,
          customerName: customer.name,
          customerPhone: customer.phone,
          customerEmail: newJob.customerEmail || customer.email || schedule.customerEmail,
          dueDate: newJob.dueDate || null,
          notes: `Cut list from frame schedule "${schedule.name}".`,
          frameScheduleId: scheduleId,
          createdBy: userId,
        })
        .returning({ id: jobs.id });
      jobId = job.id;
    }
    const limits = await getSectionLimits(tx);
    const [{ last }] = await tx
      .select({ last: sql<number>`coalesce(max(${jobItems.position}), -1)::int` })
      .from(jobItems)
      .where(eq(jobItems.jobId, jobId));
    await tx.insert(jobItems).values(
      lines.map((line, k) => ({
        jobId,
        sectionId: line.sectionId,
        lengthMm: line.length,
        quantity: line.quantity,
        label: line.label,
        note: line.note,
        angleTenths: line.angleTenths,
        marks: line.marks,
        toleranceMm: usableTolerance(
          resolveTolerance({
            nominal: line.nominal,
            nominalDefaultMm: limits.nominalToleranceMm(line.sectionId),
          }),
          line.length,
        ),
        frameScheduleId: scheduleId,
        position: last + 1 + k,
      })),
    );
    return { jobId, lineCount: lines.length };
  });
}

/** Draft and planned jobs, the ones a schedule can be sent to. */
export async function listJobsOpenForFrames() {
  const db = await getDb();
  return db
    .select({ id: jobs.id, reference: jobs.reference, customerName: jobs.customerName, status: jobs.status })
    .from(jobs)
    .where(inArray(jobs.status, [...OPEN_STATUSES]))
    .orderBy(jobs.reference);
}
