'use client';

import { useQuery } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useFormatLength } from '@/components/units/display-unit';
import { createPlanRequest, type PlanViewData } from '@/lib/queries/plans';
import { sectionOptionsQuery } from '@/lib/queries/sections';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { CreatePlanBodyInput } from '@/lib/validations/plans';

/** Plan the job again with other settings; the new plan opens beside a link to compare with this one. */
export function ReplanForm({ plan }: { plan: PlanViewData }) {
  const router = useRouter();
  const fmt = useFormatLength();
  const sections = useQuery(sectionOptionsQuery());
  const replan = useApiMutation({
    mutationFn: (settings: CreatePlanBodyInput) => createPlanRequest(plan.jobId, settings),
    onSuccess: (next) => router.push(`/plans/${next.id}?previous=${plan.id}`),
  });
  // Busy until the new plan's page opens.
  const busy = replan.isPending || replan.isSuccess;
  const errors: Record<string, string | undefined> = { form: replan.error?.message, ...replan.fieldErrors };
  const planSections = (sections.data ?? []).filter((s) => plan.sections.some((p) => p.sectionId === s.id));
  const allowed = plan.settings.stockLengthIds;

  function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const ids = data.getAll('stockLengthId').map(Number);
    const everyLength = planSections.flatMap((s) => s.stockLengths).length;
    replan.mutate({
      kerfMm: Number(data.get('kerfMm')),
      trimMm: Number(data.get('trimMm')),
      minOffcutMm: Number(data.get('minOffcutMm')),
      useOffcuts: data.get('useOffcuts') === 'on',
      timeLimitMs: Math.round(Number(data.get('seconds')) * 1000),
      stockLengthIds: ids.length === everyLength ? null : ids,
    });
  }

  const number = (name: string, label: string, value: number, step = 1) => (
    <Field label={label} error={errors[name]}>
      {(p) => <input {...p} name={name} type="number" min={0} step={step} defaultValue={value} />}
    </Field>
  );
  return (
    <form onSubmit={submit} className="space-y-4" data-testid="replan-form">
      <div className="grid gap-3 sm:grid-cols-4">
        {number('kerfMm', 'Kerf (mm)', plan.settings.kerfMm)}
        {number('trimMm', 'End trim (mm)', plan.settings.trimMm)}
        {number('minOffcutMm', 'Keep offcuts from (mm)', plan.settings.minOffcutMm)}
        {number('seconds', 'Search time (s)', plan.settings.timeLimitMs / 1000, 0.5)}
      </div>
      <label className="flex items-center gap-2">
        <input
          type="checkbox"
          name="useOffcuts"
          defaultChecked={plan.settings.useOffcuts}
          className="h-5 w-5"
        />{' '}
        Use offcuts from the rack
      </label>
      {planSections.map((s) => (
        <fieldset key={s.id}>
          <legend className="text-sm font-semibold">{s.name}: stock lengths allowed</legend>
          <div className="mt-1 flex flex-wrap gap-3">
            {s.stockLengths.map((l) => (
              <label key={l.id} className="flex items-center gap-1 text-sm">
                <input
                  type="checkbox"
                  name="stockLengthId"
                  value={l.id}
                  defaultChecked={!allowed || allowed.includes(l.id)}
                  className="h-5 w-5"
                />
                {fmt(l.lengthMm)}
              </label>
            ))}
          </div>
        </fieldset>
      ))}
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? 'Planning…' : 'Plan again with these settings'}
      </Button>
    </form>
  );
}
