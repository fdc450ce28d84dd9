import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { offcuts, stockMovements } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';

/** Moves an offcut to another rack location; the move is recorded as a stock movement. */
export async function updateOffcutLocation({
  offcutId,
  location,
  userId,
}: {
  offcutId: number;
  location: string;
  userId: number;
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [offcut] = await tx.select().from(offcuts).where(eq(offcuts.id, offcutId)).for('update');
    if (!offcut) throw notFound('That offcut');
    if (offcut.status === 'used' || offcut.status === 'scrapped') {
      throw new AppError('conflict', `Offcut ${offcut.tag} is ${offcut.status} and no longer on the rack.`);
    }
    if (offcut.location === location) return offcut;
    const [updated] = await tx
      .update(offcuts)
      .set({ location, updatedAt: new Date() })
      .where(eq(offcuts.id, offcutId))
      .returning();
    await tx.insert(stockMovements).values({
      kind: 'offcut_moved',
      userId,
      sectionId: offcut.sectionId,
      offcutId,
      lengthMm: offcut.lengthMm,
      reason: `${offcut.location || 'no location'} → ${location}`,
    });
    return updated;
  });
}
