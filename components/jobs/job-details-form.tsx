'use client';

import { useState } from 'react';
import { CustomerPicker } from '@/components/customers/customer-picker';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { readCustomerChoice } from '@/lib/customers/read-customer-choice';
import type { JobDetailsBody } from '@/lib/queries/jobs';
import { fieldIssues } from '@/lib/queries/field-errors';

type Values = { reference: string; dueDate: string; customerEmail: string; notes: string };
const fieldNames: (keyof Values)[] = ['reference', 'dueDate', 'customerEmail', 'notes'];

/** Customer (picked, or new inline), reference, due date, e-mail and notes: to create or edit a job. */
export function JobDetailsForm({
  initial,
  submitLabel,
  onSubmit,
  testId,
}: {
  initial?: Partial<Values> & { customer?: { id: number; name: string } | null };
  submitLabel: string;
  onSubmit: (body: JobDetailsBody) => Promise<unknown>;
  testId?: string;
}) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const v = Object.fromEntries(fieldNames.map((k) => [k, String(data.get(k) ?? '')])) as Values;
    setBusy(true);
    setErrors({});
    try {
      await onSubmit({
        ...readCustomerChoice(data),
        reference: v.reference || undefined,
        dueDate: v.dueDate || null,
        customerEmail: v.customerEmail,
        notes: v.notes,
      });
    } catch (error) {
      const issues = fieldIssues(error);
      setErrors({
        form: (error as Error).message,
        ...Object.fromEntries(issues.map((i) => [i.path, i.message])),
      });
    } finally {
      setBusy(false);
    }
  }

  const input = (name: keyof Values, label: string, type = 'text', hint?: string) => (
    <Field label={label} error={errors[name]} hint={hint}>
      {(p) => <input {...p} name={name} type={type} defaultValue={initial?.[name] ?? ''} />}
    </Field>
  );
  return (
    <form onSubmit={submit} className="grid gap-4 sm:grid-cols-2" data-testid={testId} noValidate>
      <CustomerPicker current={initial?.customer} error={(path) => errors[path]} />
      {input('reference', 'Reference', 'text', initial ? undefined : 'Leave empty for the next J-number.')}
      {input('dueDate', 'Due date', 'date')}
      {input('customerEmail', 'Customer e-mail', 'email')}
      <div className="sm:col-span-2">
        <Field label="Notes" error={errors.notes}>
          {(p) => <textarea {...p} name="notes" rows={2} defaultValue={initial?.notes ?? ''} />}
        </Field>
      </div>
      {errors.form && (
        <Notice tone="error" className="sm:col-span-2">
          {errors.form}
        </Notice>
      )}
      <div className="sm:col-span-2">
        <Button type="submit" disabled={busy}>
          {busy ? 'Saving…' : submitLabel}
        </Button>
      </div>
    </form>
  );
}
