import 'server-only';
import { getDb } from '@/db';
import { releasePlanInTx } from './release-plan-in-tx';

/**
 * Releases a plan to the saw: reserves every rack offcut it uses and marks the job released, all in
 * one transaction. If any offcut is no longer available (another plan took it), nothing changes and
 * the answer is a conflict naming those offcuts.
 */
export async function releasePlan({ planId, userId }: { planId: number; userId: number }) {
  const db = await getDb();
  return db.transaction((tx) => releasePlanInTx(tx, { planId, userId }));
}
