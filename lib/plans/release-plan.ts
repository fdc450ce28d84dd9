import 'server-only';
import { getDb } from '@/db';
import { AppError } from '@/lib/errors';
import { checkReleaseGate } from '@/lib/quotes/release-gate';
import { checkPlanStock } from '@/lib/stock/check-plan-stock';
import { releasePlanInTx } from './release-plan-in-tx';

/**
 * Releases a plan to the saw: reserves every rack offcut it uses and marks the job released, all in
 * one transaction. If any offcut is no longer available (another plan took it), nothing changes and
 * the answer is a conflict naming those offcuts. Before that, the release rule (lib/quotes/release-gate),
 * and a plan that needs more stock than the count shows is a conflict until the yard hand confirms it.
 */
export async function releasePlan({
  planId,
  userId,
  isOwner,
  override,
  confirmShortfall,
}: {
  planId: number;
  userId: number;
  isOwner: boolean;
  override?: string;
  /** The yard hand has seen the shortfall and says the boards are in the yard (or coming). */
  confirmShortfall?: boolean;
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    await checkReleaseGate(tx, { planId, override, userId, isOwner });
    const { short } = await checkPlanStock({ planId }, tx);
    if (short.length && !confirmShortfall) {
      const list = short.map(
        (s) => `${s.sectionName} ${s.lengthMm} mm: needs ${s.needed}, ${s.onHand} on hand`,
      );
      throw new AppError(
        'conflict',
        `Not enough stock on hand for this plan (${list.join('; ')}). Release it only if the boards are in the yard.`,
        { reason: STOCK_SHORT, short },
      );
    }
    return releasePlanInTx(tx, { planId, userId });
  });
}

/** Marks the 409 that asks the yard hand to confirm a release the stock count cannot cover. */
export const STOCK_SHORT = 'stock_short';
