import 'server-only';
import { inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, sections, stockLengths, stockMovements } from '@/db/schema';
import { parseOffcutRack, type ImportError } from '@/lib/cut-lists';
import { AppError } from '@/lib/errors';

/**
 * Enters an existing rack from a CSV, all or nothing: any bad row (or a tag already on the rack)
 * refuses the whole file with every problem listed by line. Offcuts without a tag get one issued.
 */
export async function importOffcuts({ csv, userId }: { csv: string; userId: number }) {
  const db = await getDb();
  const [sectionRows, longest] = await Promise.all([
    db.select({ id: sections.id, name: sections.name, code: sections.code }).from(sections),
    db
      .select({ sectionId: stockLengths.sectionId, max: sql<number>`max(${stockLengths.lengthMm})::int` })
      .from(stockLengths)
      .groupBy(stockLengths.sectionId),
  ]);
  const maxBySection = new Map(longest.map((l) => [String(l.sectionId), l.max]));
  const parsed = parseOffcutRack(csv, {
    sections: sectionRows.map((s) => ({ id: String(s.id), name: s.name, code: s.code })),
    maxLengthMm: (id) => maxBySection.get(id) ?? null,
  });
  if (!parsed.ok)
    throw new AppError('invalid', 'The file was not imported: fix the rows listed and try again.', {
      errors: parsed.errors,
    });

  return db.transaction(async (tx) => {
    const given = parsed.items.filter((i) => i.tag).map((i) => i.tag!.toUpperCase());
    const taken =
      given.length === 0
        ? []
        : await tx
            .select({ tag: offcuts.tag })
            .from(offcuts)
            .where(inArray(sql`upper(${offcuts.tag})`, given));
    if (taken.length > 0) {
      const takenSet = new Set(taken.map((t) => t.tag.toUpperCase()));
      const errors: ImportError[] = parsed.items
        .filter((i) => i.tag && takenSet.has(i.tag.toUpperCase()))
        .map((i) => ({ line: i.line, column: 'tag', message: `Tag "${i.tag}" is already on the rack.` }));
      throw new AppError('invalid', 'The file was not imported: fix the rows listed and try again.', {
        errors,
      });
    }
    const [{ maxId }] = await tx
      .select({ maxId: sql<number>`coalesce(max(${offcuts.id}), 0)::int` })
      .from(offcuts);
    const used = new Set(given);
    let next = maxId;
    const issueTag = () => {
      let tag: string;
      do tag = `K-${String(++next).padStart(5, '0')}`;
      while (used.has(tag));
      used.add(tag);
      return tag;
    };
    const now = new Date();
    const inserted = await tx
      .insert(offcuts)
      .values(
        parsed.items.map((i) => ({
          tag: i.tag ?? issueTag(),
          sectionId: Number(i.sectionId),
          lengthMm: i.length,
          location: i.location,
          origin: 'Imported from a rack list',
          createdAt: now,
          updatedAt: now,
        })),
      )
      .returning();
    await tx.insert(stockMovements).values(
      inserted.map((o) => ({
        at: now,
        kind: 'offcut_imported' as const,
        userId,
        sectionId: o.sectionId,
        offcutId: o.id,
        lengthMm: o.lengthMm,
        reason: 'Rack list import',
      })),
    );
    return { imported: inserted.length, tags: inserted.map((o) => o.tag) };
  });
}
