import 'server-only';
import { sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, sections, stockLengths } from '@/db/schema';
import { parseOffcutRack, type ImportError } from '@/lib/cut-lists';
import { AppError } from '@/lib/errors';
import { issueOffcutTags } from './issue-offcut-tags';
import { recordOffcutMovement } from './record-offcut-movement';

/** The most offcuts one rack list may hold (a yard's whole rack is far smaller). */
export const MAX_RACK_IMPORT_ROWS = 20_000;
const INSERT_BATCH_ROWS = 1_000;

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

  if (parsed.items.length > MAX_RACK_IMPORT_ROWS) {
    throw new AppError('invalid', `The file has more than ${MAX_RACK_IMPORT_ROWS} offcuts; split it.`, {
      errors: [{ line: parsed.items[MAX_RACK_IMPORT_ROWS].line, column: null, message: 'Too many rows.' }],
    });
  }

  return db.transaction(async (tx) => {
    // Every tag on the rack, compared in memory: one query whatever the file size.
    const onRack = new Set(
      (await tx.select({ tag: sql<string>`upper(${offcuts.tag})` }).from(offcuts)).map((r) => r.tag),
    );
    const given = parsed.items.filter((i) => i.tag).map((i) => i.tag!.toUpperCase());
    const takenSet = new Set(given.filter((tag) => onRack.has(tag)));
    if (takenSet.size > 0) {
      const errors: ImportError[] = parsed.items
        .filter((i) => i.tag && takenSet.has(i.tag.toUpperCase()))
        .map((i) => ({ line: i.line, column: 'tag', message: `Tag "${i.tag}" is already on the rack.` }));
      throw new AppError('invalid', 'The file was not imported: fix the rows listed and try again.', {
        errors,
      });
    }
    // Offcuts without a code get tags in Kerfwise's one format; the file's own codes are kept as given.
    const untagged = parsed.items.filter((i) => !i.tag).length;
    const issued = (await issueOffcutTags(tx, untagged, given)).values();
    const now = new Date();
    const rows = parsed.items.map((i) => ({
      tag: i.tag ?? issued.next().value!,
      sectionId: Number(i.sectionId),
      lengthMm: i.length,
      location: i.location,
      origin: 'Imported from a rack list',
      createdAt: now,
      updatedAt: now,
    }));
    const inserted: (typeof offcuts.$inferSelect)[] = [];
    // Batches keep each statement well under Postgres' bind-parameter limit.
    for (const batch of chunks(rows, INSERT_BATCH_ROWS)) {
      inserted.push(...(await tx.insert(offcuts).values(batch).returning()));
    }
    for (const batch of chunks(inserted, INSERT_BATCH_ROWS)) {
      await recordOffcutMovement(
        tx,
        batch.map((o) => ({
          at: now,
          kind: 'offcut_imported' as const,
          userId,
          sectionId: o.sectionId,
          offcutId: o.id,
          lengthMm: o.lengthMm,
          reason: 'Rack list import',
        })),
      );
    }
    return { imported: inserted.length, tags: inserted.map((o) => o.tag) };
  });
}

function chunks<T>(items: T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}
