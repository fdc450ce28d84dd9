'use client';

import type { QueryKey } from '@tanstack/react-query';
import { CustomerPicker } from '@/components/customers/customer-picker';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { readCustomerChoice } from '@/lib/customers/read-customer-choice';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { CreateJobBodyInput, UpdateJobBodyInput } from '@/lib/validations/jobs';

type Values = { reference: string; dueDate: string; customerEmail: string; notes: string };
const fieldNames: (keyof Values)[] = ['reference', 'dueDate', 'customerEmail', 'notes'];

/** What the form sends: fits both a new job and a change to one. */
export type JobDetailsBody = CreateJobBodyInput & UpdateJobBodyInput;

/** Customer (picked, or new inline), reference, due date, e-mail and notes: to create or edit a job. */
export function JobDetailsForm<TSaved>({
  initial,
  submitLabel,
  save,
  invalidates,
  onSaved,
  testId,
}: {
  initial?: Partial<Values> & { customer?: { id: number; name: string } | null };
  submitLabel: string;
  save: (body: JobDetailsBody) => Promise<TSaved>;
  /** Keys (from query-keys.ts) the saved details make stale. */
  invalidates?: readonly QueryKey[];
  onSaved?: (saved: TSaved) => unknown;
  testId?: string;
}) {
  const mutation = useApiMutation({ mutationFn: save, invalidates, onSuccess: onSaved });
  const errors: Record<string, string | undefined> = {
    form: mutation.error?.message,
    ...mutation.fieldErrors,
  };
  const busy = mutation.isPending;

  function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const v = Object.fromEntries(fieldNames.map((k) => [k, String(data.get(k) ?? '')])) as Values;
    mutation.mutate({
      ...readCustomerChoice(data),
      reference: v.reference || undefined,
      dueDate: v.dueDate || null,
      customerEmail: v.customerEmail,
      notes: v.notes,
    });
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
