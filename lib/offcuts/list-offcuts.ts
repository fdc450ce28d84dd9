import 'server-only';
import { and, asc, desc, eq, gte, ilike, inArray, lte, or, sql, type SQL } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, sections } from '@/db/schema';
import type { OffcutListQuery } from '@/lib/validations/offcuts';

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

function filtersOf(q: Omit<OffcutListQuery, 'sort' | 'dir' | 'page' | 'pageSize'>, now: Date): SQL[] {
  const where: SQL[] = [];
  if (q.status === 'on_rack') where.push(inArray(offcuts.status, ['available', 'reserved']));
  else if (q.status !== 'all') where.push(eq(offcuts.status, q.status));
  if (q.sectionId) where.push(eq(offcuts.sectionId, q.sectionId));
  if (q.minLengthMm !== undefined) where.push(gte(offcuts.lengthMm, q.minLengthMm));
  if (q.maxLengthMm !== undefined) where.push(lte(offcuts.lengthMm, q.maxLengthMm));
  if (q.location) where.push(eq(offcuts.location, q.location));
  if (q.minAgeDays !== undefined)
    where.push(lte(offcuts.createdAt, new Date(now.getTime() - q.minAgeDays * 86_400_000)));
  if (q.q) {
    const like = `%${escapeLike(q.q)}%`;
    where.push(
      or(
        ilike(offcuts.tag, like),
        ilike(offcuts.location, like),
        ilike(offcuts.origin, like),
        ilike(sections.name, like),
      )!,
    );
  }
  return where;
}

const SORT_COLUMNS = {
  age: offcuts.createdAt,
  length: offcuts.lengthMm,
  section: sections.name,
  location: offcuts.location,
  tag: offcuts.tag,
} as const;

/** One page of the rack with the total count, filtered and sorted in the database. */
export async function listOffcuts({ query, now = new Date() }: { query: OffcutListQuery; now?: Date }) {
  const db = await getDb();
  const where = and(...filtersOf(query, now));
  // "age desc" means oldest first, so age sorts on created_at the other way round.
  const column = SORT_COLUMNS[query.sort];
  const ascending = query.sort === 'age' ? query.dir === 'desc' : query.dir === 'asc';
  const [rows, [{ total }], locations] = await Promise.all([
    db
      .select({
        id: offcuts.id,
        tag: offcuts.tag,
        sectionId: offcuts.sectionId,
        sectionName: sections.name,
        lengthMm: offcuts.lengthMm,
        location: offcuts.location,
        status: offcuts.status,
        origin: offcuts.origin,
        scrapReason: offcuts.scrapReason,
        createdAt: offcuts.createdAt,
      })
      .from(offcuts)
      .innerJoin(sections, eq(sections.id, offcuts.sectionId))
      .where(where)
      .orderBy(ascending ? asc(column) : desc(column), asc(offcuts.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db
      .select({ total: sql<number>`count(*)::int` })
      .from(offcuts)
      .innerJoin(sections, eq(sections.id, offcuts.sectionId))
      .where(where),
    db.selectDistinct({ location: offcuts.location }).from(offcuts).orderBy(asc(offcuts.location)),
  ]);
  return {
    offcuts: rows,
    total,
    page: query.page,
    pageSize: query.pageSize,
    locations: locations.map((l) => l.location).filter(Boolean),
  };
}

/** Every offcut matching the filters (no paging), for the CSV export. */
export async function listOffcutsForExport({
  query,
  now = new Date(),
}: {
  query: OffcutListQuery;
  now?: Date;
}) {
  const db = await getDb();
  return db
    .select({
      tag: offcuts.tag,
      sectionName: sections.name,
      sectionCode: sections.code,
      lengthMm: offcuts.lengthMm,
      location: offcuts.location,
      status: offcuts.status,
      origin: offcuts.origin,
      createdAt: offcuts.createdAt,
    })
    .from(offcuts)
    .innerJoin(sections, eq(sections.id, offcuts.sectionId))
    .where(and(...filtersOf(query, now)))
    .orderBy(asc(sections.name), desc(offcuts.lengthMm), asc(offcuts.id));
}
