import 'server-only';
import { inArray } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { recordOffcutMovement } from './record-offcut-movement';

/**
 * Moves one or many offcuts to a rack location, all or none, in one transaction: one
 * 'offcut_moved' movement for each offcut whose place changed. Used, scrapped or unknown offcuts
 * refuse the whole move, so a half-moved rack never happens.
 */
export async function moveOffcuts({
  ids,
  location,
  userId,
}: {
  ids: number[];
  location: string;
  userId: number;
}) {
  const unique = [...new Set(ids)];
  const db = await getDb();
  return db.transaction(async (tx) => {
    const rows = await tx
      .select()
      .from(offcuts)
      .where(inArray(offcuts.id, unique))
      .orderBy(offcuts.id)
      .for('update');
    const missing = unique.filter((id) => !rows.some((r) => r.id === id));
    if (missing.length > 0) throw new AppError('not_found', `No offcut with id ${missing.join(', ')}.`);
    const gone = rows.filter((r) => r.status === 'used' || r.status === 'scrapped');
    if (gone.length > 0) {
      throw new AppError(
        'conflict',
        `Only offcuts on the rack can be moved: ${gone.map((r) => `${r.tag} is ${r.status}`).join(', ')}.`,
      );
    }
    const moving = rows.filter((r) => r.location !== location);
    if (moving.length > 0) {
      const now = new Date();
      await tx
        .update(offcuts)
        .set({ location, updatedAt: now })
        .where(
          inArray(
            offcuts.id,
            moving.map((r) => r.id),
          ),
        );
      await recordOffcutMovement(
        tx,
        moving.map((r) => ({
          at: now,
          kind: 'offcut_moved' as const,
          userId,
          sectionId: r.sectionId,
          offcutId: r.id,
          lengthMm: r.lengthMm,
          reason: `Moved from ${r.location || 'nowhere recorded'} to ${location}`,
        })),
      );
    }
    return {
      moved: moving.length,
      offcuts: rows.map((r) => ({ id: r.id, tag: r.tag, location })),
    };
  });
}
