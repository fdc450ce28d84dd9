import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PlanView } from '@/components/plans/plan-view';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { AppError } from '@/lib/errors';
import { getPlanContext } from '@/lib/plans/get-plan-context';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Plan' };

type Props = { params: Promise<{ planId: string }>; searchParams: Promise<{ previous?: string }> };

export default async function PlanPage({ params, searchParams }: Props) {
  const user = await requirePageUser('plans:read');
  const [{ planId }, { previous }, yard] = await Promise.all([params, searchParams, getYardSettings()]);
  const id = Number(planId);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  const context = await getPlanContext({ planId: id }).catch((e) =>
    e instanceof AppError ? null : Promise.reject(e),
  );
  if (!context) notFound();
  return (
    <DisplayUnitProvider yardUnit={yard.displayUnit}>
      <PlanView
        planId={id}
        context={context}
        previousPlanId={previous ? Number(previous) || undefined : undefined}
        canAct={can(user.role, 'plans:release')}
        isOwner={can(user.role, 'plans:override-release')}
      />
    </DisplayUnitProvider>
  );
}
