import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobItems } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { parseCutList, type ImportError } from '@/lib/cut-lists';
import { resolveTolerance } from '@/lib/nominal/tolerance';
import { openJobForItemEdits } from './open-job-for-item-edits';
import { getSectionLimits } from './section-limits';

const INSERT_BATCH = 1_000;

export type ImportJobItemsResult = { ok: true; imported: number } | { ok: false; errors: ImportError[] };

/**
 * Imports a cut list into a job, all or nothing: every row is checked against the yard's sections
 * and longest lengths first; one bad row and nothing is saved. `replace` swaps the whole list.
 */
export async function importJobItems({
  jobId,
  csvText,
  replace = false,
}: {
  jobId: number;
  csvText: string;
  replace?: boolean;
}): Promise<ImportJobItemsResult> {
  const db = await getDb();
  return db
    .transaction(async (tx) => {
      await openJobForItemEdits(tx, jobId);
      const limits = await getSectionLimits(tx);
      const parsed = parseCutList(csvText, {
        sections: limits.sections.map((s) => ({ id: String(s.id), name: s.name, code: s.code })),
        maxLengthMm: (id) => limits.longestMm(Number(id)),
        minPieceMm: limits.minSafePieceMm,
      });
      if (!parsed.ok) {
        // Roll back the draft/superseded change above: a failed import changes nothing.
        throw new ImportRejected(parsed.errors);
      }
      if (replace) await tx.delete(jobItems).where(eq(jobItems.jobId, jobId));
      const [{ next }] = await tx
        .select({ next: sql<number>`coalesce(max(${jobItems.position}), -1)::int + 1` })
        .from(jobItems)
        .where(eq(jobItems.jobId, jobId));
      const rows = parsed.items.map((item, i) => ({
        jobId,
        sectionId: Number(item.sectionId),
        lengthMm: item.length,
        quantity: item.quantity,
        label: item.label ?? '',
        note: item.note ?? '',
        toleranceMm: resolveTolerance({
          toleranceMm: item.toleranceMm,
          nominal: item.nominal,
          nominalDefaultMm: limits.nominalToleranceMm(Number(item.sectionId)),
        }),
        position: next + i,
      }));
      for (let i = 0; i < rows.length; i += INSERT_BATCH)
        await tx.insert(jobItems).values(rows.slice(i, i + INSERT_BATCH));
      return { ok: true as const, imported: rows.length };
    })
    .catch((error: unknown) => {
      if (error instanceof ImportRejected) return { ok: false as const, errors: error.errors };
      throw error;
    });
}

class ImportRejected extends AppError {
  constructor(public readonly errors: ImportError[]) {
    super('invalid', 'The file was not imported.');
  }
}
