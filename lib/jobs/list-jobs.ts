import 'server-only';
import { and, asc, eq, gte, ilike, inArray, lte, notInArray, or, sql, type SQL } from 'drizzle-orm';
import { getDb } from '@/db';
import { OPEN_JOB_STATUSES } from '@/db/enums';
import { jobItems, jobs } from '@/db/schema';
import { paymentState } from '@/lib/quotes/payment-state';
import type { ListJobsQuery } from '@/lib/validations/jobs';

const OPEN = [...OPEN_JOB_STATUSES];
const like = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/**
 * Jobs matching the office's filters, with piece counts: open jobs first (only open ones unless
 * `show` or `status` asks for more), then soonest due (undated last).
 */
export async function listJobs(query: ListJobsQuery = {}) {
  const db = await getDb();
  const where: SQL[] = [];
  if (query.q) {
    where.push(or(ilike(jobs.reference, like(query.q)), ilike(jobs.customerName, like(query.q)))!);
  }
  if (query.customer) where.push(ilike(jobs.customerName, like(query.customer)));
  if (query.status) where.push(eq(jobs.status, query.status));
  else if ((query.show ?? 'open') === 'open') where.push(inArray(jobs.status, OPEN));
  else if (query.show === 'closed') where.push(notInArray(jobs.status, OPEN));
  if (query.dueFrom) where.push(gte(jobs.dueDate, query.dueFrom));
  if (query.dueTo) where.push(lte(jobs.dueDate, query.dueTo));
  const rows = await db
    .select({
      id: jobs.id,
      reference: jobs.reference,
      customerName: jobs.customerName,
      customerEmail: jobs.customerEmail,
      dueDate: jobs.dueDate,
      status: jobs.status,
      itemCount: sql<number>`count(${jobItems.id})::int`,
      pieceCount: sql<number>`coalesce(sum(${jobItems.quantity}), 0)::int`,
      // The latest quote (by version) and what the job has paid, for the state at a glance.
      quote: sql<{
        number: string;
        accepted_at: string | null;
        on_account: boolean;
        gross_pence: number;
        deposit_pence: number;
      } | null>`(select row_to_json(q) from (select number, accepted_at, on_account, gross_pence, deposit_pence
          from quotes where quotes.job_id = ${jobs.id} order by version desc limit 1) q)`,
      paidPence: sql<number>`(select coalesce(sum(amount_pence), 0)::int from payments
          where payments.job_id = ${jobs.id} and payments.status = 'succeeded')`,
    })
    .from(jobs)
    .leftJoin(jobItems, eq(jobItems.jobId, jobs.id))
    .where(where.length ? and(...where) : undefined)
    .groupBy(jobs.id)
    .orderBy(
      notInArray(jobs.status, OPEN), // false (open) sorts before true (closed)
      sql`${jobs.dueDate} asc nulls last`,
      asc(jobs.reference),
    );
  return rows.map(({ quote, paidPence, ...row }) => ({
    ...row,
    quoteNumber: quote?.number ?? null,
    paymentState: quote
      ? paymentState(
          {
            acceptedAt: quote.accepted_at ? new Date(quote.accepted_at) : null,
            onAccount: quote.on_account,
            grossPence: quote.gross_pence,
            depositPence: quote.deposit_pence,
          },
          paidPence,
        )
      : null,
  }));
}
export type JobListRow = Awaited<ReturnType<typeof listJobs>>[number];
