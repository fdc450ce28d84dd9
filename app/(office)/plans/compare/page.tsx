import type { Metadata } from 'next';
import { PlanCompare } from '@/components/plans/plan-compare';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Compare plans' };

export default async function ComparePlansPage({
  searchParams,
}: {
  searchParams: Promise<{ a?: string; b?: string }>;
}) {
  await requirePageUser('plans:read');
  const [{ a, b }, yard] = await Promise.all([searchParams, getYardSettings()]);
  const ids = [Number(a), Number(b)];
  const valid = ids.every((id) => Number.isSafeInteger(id) && id > 0);
  return (
    <DisplayUnitProvider yardUnit={yard.displayUnit}>
      <PageHeader
        title="Compare plans"
        lead="Two plans side by side; the better figure in each row is in bold."
      />
      {valid ? (
        <PlanCompare ids={ids as [number, number]} />
      ) : (
        <Notice tone="warning">Choose two plans to compare from a job page.</Notice>
      )}
    </DisplayUnitProvider>
  );
}
