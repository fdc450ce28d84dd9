import type { Metadata } from 'next';
import Link from 'next/link';
import { CutSheet } from '@/components/plans/cut-sheet';
import { PrintButton } from '@/components/plans/print-button';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { getJobById } from '@/lib/jobs/get-job';
import { planOrNotFound } from '@/lib/pages/page-records';
import { getPlanById } from '@/lib/plans/get-plan';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Cut sheet' };

export default async function CutSheetPage({ params }: { params: Promise<{ planId: string }> }) {
  await requirePageUser('plans:read');
  const { id: planId, context } = await planOrNotFound((await params).planId);
  const [plan, yard] = await Promise.all([getPlanById({ planId }), getYardSettings()]);
  const { job } = await getJobById({ jobId: plan.jobId });
  return (
    <DisplayUnitProvider yardUnit={yard.displayUnit}>
      <div className="no-print mb-4 flex flex-wrap items-center gap-4">
        <PrintButton />
        <a className="font-semibold text-spruce underline" href={`/api/plans/${planId}/cut-sheet`}>
          Download PDF
        </a>
        <Link className="font-semibold text-spruce underline" href={`/plans/${planId}`}>
          Back to the plan
        </Link>
      </div>
      <CutSheet plan={plan} job={job} yardName={yard.yardName} offcutTags={context.offcutTags} />
    </DisplayUnitProvider>
  );
}
