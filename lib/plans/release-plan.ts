import 'server-only';
import { getDb } from '@/db';
import { checkReleaseGate } from '@/lib/quotes/release-gate';
import { releasePlanInTx } from './release-plan-in-tx';

/**
 * Releases a plan to the saw: reserves every rack offcut it uses and marks the job released, all in
 * one transaction. If any offcut is no longer available (another plan took it), nothing changes and
 * the answer is a conflict naming those offcuts. Before that, the release rule (lib/quotes/release-gate).
 */
export async function releasePlan({
  planId,
  userId,
  isOwner,
  override,
}: {
  planId: number;
  userId: number;
  isOwner: boolean;
  override?: string;
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    await checkReleaseGate(tx, { planId, override, userId, isOwner });
    return releasePlanInTx(tx, { planId, userId });
  });
}
