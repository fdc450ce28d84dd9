import 'server-only';
import { asc } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { sections, yardSettings } from '@/db/schema';
import type { FrameContext, SectionDimensions } from '@/lib/frames';
import type { FrameSectionOption } from './frame-section-option';

/** The yard's sections with the sizes the frame geometry needs, for the editor and the server checks; and the yard's region and minimum safe piece length. */
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
  const [yard] = await conn
    .select({ region: yardSettings.region, minPieceMm: yardSettings.minSafePieceMm })
    .from(yardSettings)
    .limit(1);
  // The geometry with the yard's piece names and its minimum safe piece length.
  const context: FrameContext = { sections: dimensions, region: yard?.region, minPieceMm: yard?.minPieceMm };
  return { list: rows satisfies FrameSectionOption[], dimensions, context };
}
