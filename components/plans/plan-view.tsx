'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { Card } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { PlanProgress } from '@/components/saw/plan-progress';
import { UnitToggle } from '@/components/units/unit-toggle';
import type { PlanContext } from '@/lib/plans/get-plan-context';
import { planQuery } from '@/lib/queries/plans';
import { DiagramLegend } from './diagram-legend';
import { EmailSheetForm } from './email-sheet-form';
import { PlanFigures } from './plan-figures';
import { PlanSectionBoards } from './plan-section-boards';
import { QuotePanel } from '@/components/quotes/quote-panel';
import { ReleaseControls } from './release-controls';
import { ReplanForm } from './replan-form';

/** The plan page: actions, figures and price, then every section's boards drawn to scale. */
export function PlanView({
  planId,
  context,
  previousPlanId,
  canAct,
  isOwner,
}: {
  planId: number;
  context: PlanContext;
  previousPlanId?: number;
  canAct: boolean;
  isOwner: boolean;
}) {
  const plan = useQuery(planQuery(planId));
  if (plan.isPending) return <p>Loading the plan…</p>;
  if (plan.error) return <Notice tone="error">{plan.error.message}</Notice>;
  const p = plan.data;
  const { job } = context;
  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm">
            <Link href={`/jobs/${job.jobId}`} className="font-semibold text-spruce underline">
              {job.reference} · {job.customerName}
            </Link>
          </p>
          <h1 className="text-3xl font-bold tracking-tight">Plan {p.id}</h1>
          <p className="text-bark-soft">
            {p.status} · kerf {p.settings.kerfMm} mm, end trim {p.settings.trimMm} mm, offcuts kept from{' '}
            {p.settings.minOffcutMm} mm{p.settings.useOffcuts ? '' : ', rack not used'}
          </p>
          {(p.status === 'released' || p.status === 'done') && (
            <p className="mt-1">
              <PlanProgress planId={p.id} />
            </p>
          )}
        </div>
        <div className="no-print flex flex-wrap items-center gap-3">
          <UnitToggle />
          <Link className="font-semibold text-spruce underline" href={`/plans/${p.id}/sheet`}>
            Printable cut sheet
          </Link>
          <a className="font-semibold text-spruce underline" href={`/api/plans/${p.id}/cut-sheet`}>
            Download PDF
          </a>
          {previousPlanId && (
            <Link
              className="font-semibold text-spruce underline"
              href={`/plans/compare?a=${previousPlanId}&b=${p.id}`}
            >
              Compare with plan {previousPlanId}
            </Link>
          )}
        </div>
      </header>
      {canAct && <ReleaseControls plan={p} isOwner={isOwner} />}
      <Card>
        <PlanFigures plan={p} />
      </Card>
      {canAct && (
        <Card>
          <QuotePanel plan={p} canShare={canAct} />
        </Card>
      )}
      <Card className="space-y-6">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 className="text-xl font-bold">Boards in saw order</h2>
          <DiagramLegend />
        </div>
        {p.sections.map((s) => (
          <PlanSectionBoards
            key={s.sectionId}
            name={s.sectionName}
            kerfMm={p.settings.kerfMm}
            offcutTags={context.offcutTags}
            boards={p.boards.filter((b) => b.sectionId === s.sectionId)}
          />
        ))}
      </Card>
      {canAct && (
        <div className="no-print grid gap-6 lg:grid-cols-2">
          <Card>
            <h2 className="mb-3 text-xl font-bold">Send to the customer</h2>
            <EmailSheetForm planId={p.id} defaultTo={job.customerEmail} />
          </Card>
          {(job.jobStatus === 'draft' || job.jobStatus === 'planned') && (
            <Card>
              <h2 className="mb-3 text-xl font-bold">Plan again</h2>
              <ReplanForm plan={p} />
            </Card>
          )}
        </div>
      )}
    </div>
  );
}
