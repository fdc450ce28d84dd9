import 'server-only';
import { inArray } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { getSectionPencePerMetre } from '@/lib/stock/section-prices';
import type { ScrapOffcutsBody } from '@/lib/validations/offcuts';
import { recordOffcutMovement } from './record-offcut-movement';

/**
 * Scraps offcuts that lie on the rack, all or none: a reserved, used or scrapped offcut in the
 * list refuses the whole request so nothing a plan counts on disappears.
 */
export async function scrapOffcuts({ body, userId }: { body: ScrapOffcutsBody; userId: number }) {
  const db = await getDb();
  const ids = [...new Set(body.ids)];
  return db.transaction(async (tx) => {
    const rows = await tx
      .select()
      .from(offcuts)
      .where(inArray(offcuts.id, ids))
      .orderBy(offcuts.id)
      .for('update');
    const missing = ids.filter((id) => !rows.some((r) => r.id === id));
    if (missing.length > 0) throw new AppError('not_found', `No offcut with id ${missing.join(', ')}.`);
    const blocked = rows.filter((r) => r.status !== 'available');
    if (blocked.length > 0) {
      throw new AppError(
        'conflict',
        `Only available offcuts can be scrapped: ${blocked.map((r) => `${r.tag} is ${r.status}`).join(', ')}.`,
      );
    }
    // Scrap is valued at the section's cheapest price per metre, as in the reports.
    const perMetre = await getSectionPencePerMetre(tx);
    const now = new Date();
    await tx
      .update(offcuts)
      .set({ status: 'scrapped', scrapReason: body.reason, updatedAt: now })
      .where(inArray(offcuts.id, ids));
    await recordOffcutMovement(
      tx,
      rows.map((o) => ({
        at: now,
        kind: 'offcut_scrapped' as const,
        userId,
        sectionId: o.sectionId,
        offcutId: o.id,
        lengthMm: o.lengthMm,
        valuePence: Math.round((o.lengthMm * (perMetre.get(o.sectionId) ?? 0)) / 1000),
        reason: body.reason,
      })),
    );
    return { scrapped: rows.length };
  });
}
