import 'server-only';
import { sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, offcuts, sections } from '@/db/schema';

/** Headline counts for the owner's overview. */
export async function getYardOverview() {
  const db = await getDb();
  const [[sectionCount], [rack], [openJobs]] = await Promise.all([
    db.select({ n: sql<number>`count(*)::int` }).from(sections),
    db
      .select({ n: sql<number>`count(*)::int`, mm: sql<number>`coalesce(sum(${offcuts.lengthMm}), 0)::int` })
      .from(offcuts)
      .where(sql`${offcuts.status} = 'available'`),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(jobs)
      .where(sql`${jobs.status} not in ('done', 'cancelled')`),
  ]);
  return { sections: sectionCount.n, rackOffcuts: rack.n, rackMetres: rack.mm / 1000, openJobs: openJobs.n };
}
