import 'server-only';
import { desc, eq, isNotNull } from 'drizzle-orm';
import { getDb } from '@/db';
import { sections, stockMovements, users } from '@/db/schema';

/** The latest changes to stock lengths on hand: deliveries, counts and what the saw cut (and took back). */
export async function listStockMovements({ limit = 30 }: { limit?: number } = {}) {
  const db = await getDb();
  return db
    .select({
      id: stockMovements.id,
      at: stockMovements.at,
      kind: stockMovements.kind,
      sectionName: sections.name,
      lengthMm: stockMovements.lengthMm,
      quantityDelta: stockMovements.quantityDelta,
      reason: stockMovements.reason,
      planId: stockMovements.planId,
      userName: users.name,
    })
    .from(stockMovements)
    .innerJoin(sections, eq(sections.id, stockMovements.sectionId))
    .leftJoin(users, eq(users.id, stockMovements.userId))
    .where(isNotNull(stockMovements.stockLengthId))
    .orderBy(desc(stockMovements.at), desc(stockMovements.id))
    .limit(limit);
}
