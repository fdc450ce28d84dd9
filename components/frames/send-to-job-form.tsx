'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { CustomerPicker } from '@/components/customers/customer-picker';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { readCustomerChoice } from '@/lib/customers/read-customer-choice';
import type { CustomerChoice } from '@/lib/validations/customers';
import type { SendScheduleToJobBodyInput } from '@/lib/validations/frames';
import type { listJobsOpenForFrames } from '@/lib/frames-data/send-schedule-to-job';
import { ApiError } from '@/lib/queries/fetch-json';
import { sendScheduleToJobRequest } from '@/lib/queries/frames';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** A job the schedule may go to, as the server page lists them. */
export type OpenJob = Awaited<ReturnType<typeof listJobsOpenForFrames>>[number];

type Props = {
  scheduleId: number;
  customerName: string;
  customerEmail: string;
  openJobs: OpenJob[];
  disabled: boolean;
  beforeSend: () => Promise<void>;
};

/** Sends the saved cut list, summed by section, to a new job or a draft or planned one, then opens the job. */
export function SendToJobForm({
  scheduleId,
  customerName,
  customerEmail,
  openJobs,
  disabled,
  beforeSend,
}: Props) {
  const router = useRouter();
  const [target, setTarget] = useState<'new' | 'existing'>('new');
  const send = useApiMutation({
    mutationFn: async (body: SendScheduleToJobBodyInput) => {
      await beforeSend();
      return sendScheduleToJobRequest(scheduleId, body);
    },
    onSuccess: ({ jobId }) => router.push(`/jobs/${jobId}`),
  });
  const error = (path: string): string | undefined => send.fieldErrors[path];
  // The job already holds this schedule's pieces: the server asks before adding a second set.
  const alreadySent =
    send.error instanceof ApiError &&
    send.error.status === 409 &&
    Boolean((send.error.body as { details?: { alreadySent?: number } })?.details?.alreadySent);
  const [lastJobId, setLastJobId] = useState<number | null>(null);

  function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    if (target === 'existing') {
      const jobId = Number(form.get('jobId') ?? 0);
      setLastJobId(jobId);
      send.mutate({ jobId });
    } else
      send.mutate({
        newJob: {
          ...(readCustomerChoice(form) as CustomerChoice),
          customerEmail: String(form.get('customerEmail') ?? ''),
          reference: String(form.get('reference') ?? '') || undefined,
          dueDate: String(form.get('dueDate') ?? '') || undefined,
        },
      });
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" data-testid="send-to-job-form" noValidate>
      <fieldset className="flex flex-wrap gap-4">
        <legend className="mb-2 text-sm font-semibold">Send the cut list to</legend>
        {(['new', 'existing'] as const).map((value) => (
          <label key={value} className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name="target"
              className="size-5"
              checked={target === value}
              onChange={() => setTarget(value)}
            />
            {value === 'new' ? 'A new job' : 'A draft or planned job'}
          </label>
        ))}
      </fieldset>
      {target === 'new' ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <CustomerPicker suggestedName={customerName} error={(path) => error(`newJob.${path}`)} />
          <Field label="Customer e-mail" error={error('newJob.customerEmail')}>
            {(p) => (
              <input
                {...p}
                name="customerEmail"
                type="email"
                defaultValue={customerEmail}
                autoComplete="off"
              />
            )}
          </Field>
          <Field label="Job reference" hint="Blank: the next number" error={error('newJob.reference')}>
            {(p) => <input {...p} name="reference" autoComplete="off" />}
          </Field>
          <Field label="Due date" error={error('newJob.dueDate')}>
            {(p) => <input {...p} name="dueDate" type="date" />}
          </Field>
        </div>
      ) : (
        <Field
          label="Job"
          error={error('jobId')}
          hint="A planned job goes back to draft: its plan no longer covers all its pieces."
        >
          {(p) => (
            <select {...p} name="jobId" defaultValue="">
              <option value="" disabled>
                Choose a job…
              </option>
              {openJobs.map((j) => (
                <option key={j.id} value={j.id}>{`${j.reference} · ${j.customerName} (${j.status})`}</option>
              ))}
            </select>
          )}
        </Field>
      )}
      {alreadySent && lastJobId ? (
        <div className="space-y-2" data-testid="already-sent">
          <Notice tone="warning">{send.error?.message}</Notice>
          <div className="flex flex-wrap gap-2">
            <Button
              type="button"
              onClick={() => send.mutate({ jobId: lastJobId, ifAlreadySent: 'replace' })}
              disabled={send.isPending}
            >
              Replace them
            </Button>
            <Button
              type="button"
              variant="secondary"
              onClick={() => send.mutate({ jobId: lastJobId, ifAlreadySent: 'add' })}
              disabled={send.isPending}
            >
              Add a second set
            </Button>
          </div>
        </div>
      ) : (
        send.error &&
        !Object.keys(send.fieldErrors).length && <Notice tone="error">{send.error.message}</Notice>
      )}
      {send.isSuccess && <Notice>Sent. Opening the job…</Notice>}
      <Button type="submit" size="lg" disabled={disabled || send.isPending || send.isSuccess}>
        {send.isPending ? 'Sending…' : 'Send cut list to job'}
      </Button>
    </form>
  );
}
