import 'server-only';
import { asc } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { sections } from '@/db/schema';
import type { SectionDimensions } from '@/lib/frames';
import type { FrameSectionOption } from './frame-section-option';

/** The yard's sections with the sizes the frame geometry needs, for the editor and the server checks. */
export async function getYardFrameSections({ db }: { db?: DbOrTx } = {}) {
  const conn = db ?? (await getDb());
  const rows = await conn
    .select({
      id: sections.id,
      name: sections.name,
      thickness: sections.thicknessMm,
      width: sections.widthMm,
      active: sections.active,
    })
    .from(sections)
    .orderBy(asc(sections.name));
  const dimensions = new Map<number, SectionDimensions>(
    rows.map((s) => [s.id, { thickness: s.thickness, width: s.width }]),
  );
  return { list: rows satisfies FrameSectionOption[], dimensions };
}
