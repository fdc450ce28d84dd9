import type { Metadata } from 'next';
import { PlanView } from '@/components/plans/plan-view';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { planOrNotFound } from '@/lib/pages/page-records';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Plan' };

type Props = { params: Promise<{ planId: string }>; searchParams: Promise<{ previous?: string }> };

export default async function PlanPage({ params, searchParams }: Props) {
  const user = await requirePageUser('plans:read');
  const [{ planId }, { previous }, yard] = await Promise.all([params, searchParams, getYardSettings()]);
  const { id, context } = await planOrNotFound(planId);
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
