'use client';

import { useRouter } from 'next/navigation';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { createFrameScheduleRequest } from '@/lib/queries/frames';
import type { DisplayUnit } from '@/lib/units';
import { fieldIssues } from '@/lib/queries/field-errors';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** Starts an empty schedule and opens it in the editor. */
export function NewScheduleForm() {
  const router = useRouter();
  const create = useApiMutation({
    mutationFn: createFrameScheduleRequest,
    onSuccess: (s) => router.push(`/frames/${s.id}`),
  });
  const issues = fieldIssues(create.error);
  const error = (path: string) => issues.find((i) => i.path === path)?.message;

  function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    create.mutate({
      name: String(form.get('name')),
      customerName: String(form.get('customerName')),
      unit: String(form.get('unit')) as DisplayUnit,
    });
  }

  return (
    <form
      onSubmit={onSubmit}
      className="grid items-start gap-3 sm:grid-cols-[2fr_2fr_1fr_auto]"
      data-testid="new-schedule-form"
      noValidate
    >
      <Field label="Schedule name" error={error('name')} hint='e.g. "Lean-to for the Marsh garden"'>
        {(p) => <input {...p} name="name" autoComplete="off" />}
      </Field>
      <Field label="Customer" error={error('customerName')}>
        {(p) => <input {...p} name="customerName" autoComplete="off" />}
      </Field>
      <Field label="Lengths in">
        {(p) => (
          <select {...p} name="unit" defaultValue="mm">
            <option value="mm">mm</option>
            <option value="imperial">ft-in</option>
          </select>
        )}
      </Field>
      <Button type="submit" className="sm:mt-6" disabled={create.isPending}>
        Start schedule
      </Button>
      {create.error && !issues.length && (
        <Notice tone="error" className="sm:col-span-4">
          {create.error.message}
        </Notice>
      )}
    </form>
  );
}
