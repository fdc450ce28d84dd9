// Every change to an offcut is a stock movement row: this is the one place that writes them.
import type { Tx } from '@/db';
import { stockMovements, type NewStockMovement } from '@/db/schema';
import type { MovementKind } from '@/db/enums';

/** A movement of one offcut: made, imported, reserved, used, moved, scrapped, or a board taken back. */
export type OffcutMovement = Omit<NewStockMovement, 'id' | 'kind' | 'offcutId' | 'quantityDelta'> & {
  kind: MovementKind;
  offcutId: number;
};

/** Records one or more offcut movements in the caller's transaction. */
export async function recordOffcutMovement(tx: Tx, movement: OffcutMovement | OffcutMovement[]) {
  const rows = Array.isArray(movement) ? movement : [movement];
  if (rows.length === 0) return;
  await tx.insert(stockMovements).values(rows);
}
