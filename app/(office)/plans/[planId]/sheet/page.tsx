import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { CutSheet } from '@/components/plans/cut-sheet';
import { PrintButton } from '@/components/plans/print-button';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { AppError } from '@/lib/errors';
import { getJobById } from '@/lib/jobs/get-job';
import { getPlanById } from '@/lib/plans/get-plan';
import { getPlanContext } from '@/lib/plans/get-plan-context';
import type { PlanViewData } from '@/lib/queries/plans';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Cut sheet' };

export default async function CutSheetPage({ params }: { params: Promise<{ planId: string }> }) {
  await requirePageUser('plans:read');
  const planId = Number((await params).planId);
  if (!Number.isSafeInteger(planId) || planId <= 0) notFound();
  const loaded = await Promise.all([
    getPlanById({ planId }),
    getPlanContext({ planId }),
    getYardSettings(),
  ]).catch((e) => (e instanceof AppError ? null : Promise.reject(e)));
  if (!loaded) notFound();
  const [plan, context, yard] = loaded;
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
      <CutSheet
        plan={JSON.parse(JSON.stringify(plan)) as PlanViewData}
        job={job}
        yardName={yard.yardName}
        offcutTags={context.offcutTags}
      />
    </DisplayUnitProvider>
  );
}
