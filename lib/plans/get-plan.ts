import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { planBoards, plans } from '@/db/schema';
import { notFound } from '@/lib/errors';
import type { CuttingPlanPrice } from '@/lib/pricing';
import type { BoardPiece, PlanSection, PlanSettings, PlanTotals } from './plan-shapes';

/** A plan as the API answers it: the solver's input and output per section, totals, price, boards. */
export async function getPlanById({ planId }: { planId: number }) {
  const db = await getDb();
  const [plan] = await db.select().from(plans).where(eq(plans.id, planId));
  if (!plan) throw notFound('That plan');
  const boards = await db
    .select()
    .from(planBoards)
    .where(eq(planBoards.planId, planId))
    .orderBy(asc(planBoards.boardNo));
  return {
    id: plan.id,
    jobId: plan.jobId,
    status: plan.status,
    settings: plan.settings as PlanSettings,
    sections: plan.sections as PlanSection[],
    totals: plan.totals as PlanTotals,
    price: plan.price as CuttingPlanPrice | null,
    pricePence: plan.pricePence,
    createdAt: plan.createdAt,
    releasedAt: plan.releasedAt,
    boards: boards.map((b) => ({ ...b, pieces: b.pieces as BoardPiece[] })),
  };
}
export type PlanView = Awaited<ReturnType<typeof getPlanById>>;
