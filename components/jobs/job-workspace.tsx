'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { UnitToggle } from '@/components/units/unit-toggle';
import { jobQuery, updateJobRequest } from '@/lib/queries/jobs';
import { CancelJob } from './cancel-job';
import { CutListImport } from './cut-list-import';
import { ItemsTable } from './items-table';
import { JobDetailsForm } from './job-details-form';
import { JobPlans } from './job-plans';
import { JobStatusBadge } from './job-status-badge';
import { jobKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** Everything the yard hand does to one job: details, cut list, import, planning. */
export function JobWorkspace({ jobId }: { jobId: number }) {
  const job = useQuery(jobQuery(jobId));
  const [editing, setEditing] = useState(false);
  const changeStatus = useApiMutation({
    mutationFn: (status: 'cancelled' | 'draft') => updateJobRequest(jobId, { status }),
    invalidates: [jobKeys.detail(jobId)],
  });
  if (job.isPending) return <p>Loading the job…</p>;
  if (job.error) return <Notice tone="error">{job.error.message}</Notice>;
  const { job: j, items, plans } = job.data;
  const listEditable = j.status === 'draft' || j.status === 'planned';
  // The workspace shows a failed change's message; the caller only needs to know it has finished.
  const setStatus = (status: 'cancelled' | 'draft') =>
    changeStatus.mutateAsync(status).then(
      () => undefined,
      () => undefined,
    );

  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold tracking-tight">
            {j.reference} <span className="font-normal text-bark-soft">· {j.customerName}</span>
          </h1>
          <p className="mt-1 flex items-center gap-3 text-bark-soft">
            <JobStatusBadge status={j.status} /> Due {j.dueDate ?? 'not set'}{' '}
            {j.customerEmail && <>· {j.customerEmail}</>}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <UnitToggle />
          <Button variant="secondary" onClick={() => setEditing((e) => !e)} aria-expanded={editing}>
            {editing ? 'Close details' : 'Edit details'}
          </Button>
          {j.status === 'cancelled' && (
            <Button variant="secondary" onClick={() => setStatus('draft')}>
              Reopen job
            </Button>
          )}
        </div>
      </header>
      {changeStatus.error && <Notice tone="error">{changeStatus.error.message}</Notice>}
      {editing && (
        <Card>
          <JobDetailsForm
            initial={{
              customer: j.customerId ? { id: j.customerId, name: j.customerName } : null,
              reference: j.reference,
              dueDate: j.dueDate ?? '',
              customerEmail: j.customerEmail,
              notes: j.notes,
            }}
            submitLabel="Save details"
            save={(body) => updateJobRequest(jobId, body)}
            invalidates={[jobKeys.detail(jobId)]}
            onSaved={() => setEditing(false)}
          />
          {listEditable && (
            <div className="mt-6 border-t-2 border-shaving pt-4">
              <CancelJob reference={j.reference} onCancel={() => setStatus('cancelled')} />
            </div>
          )}
        </Card>
      )}
      {j.notes && !editing && <p className="text-bark-soft">{j.notes}</p>}
      <Card>
        <h2 className="mb-3 text-xl font-bold">Cut list</h2>
        {!listEditable && (
          <Notice tone="info" className="mb-3">
            The cut list is locked while the job is {j.status}.
          </Notice>
        )}
        <ItemsTable jobId={jobId} items={items} editable={listEditable} />
      </Card>
      {listEditable && (
        <Card>
          <h2 className="mb-3 text-xl font-bold">Import a cut list</h2>
          <CutListImport jobId={jobId} />
        </Card>
      )}
      <Card>
        <h2 className="mb-3 text-xl font-bold">Plans</h2>
        <JobPlans jobId={jobId} plans={plans} canPlan={listEditable && items.length > 0} />
      </Card>
    </div>
  );
}
