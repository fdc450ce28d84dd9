import 'server-only';
import { getDb } from '@/db';
import type { ReceiptBody } from '@/lib/validations/stock';
import { applyStockMovement } from './apply-stock-movement';

/** A delivery: one receipt movement per line, all or nothing. */
export async function receiveStock({ body, userId }: { body: ReceiptBody; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const at = new Date();
    const movements = [];
    for (const line of body.lines) {
      movements.push(
        await applyStockMovement(tx, {
          kind: 'receipt',
          stockLengthId: line.stockLengthId,
          quantityDelta: line.quantity,
          userId,
          reason: body.reference,
          at,
        }),
      );
    }
    return movements;
  });
}
