'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useDeferredValue, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { createJobRequest, jobsQuery, type JobFilters as Filters } from '@/lib/queries/jobs';
import { jobKeys } from '@/lib/queries/query-keys';
import { JobDetailsForm } from './job-details-form';
import { JobFilters } from './job-filters';
import { PAYMENT_STATE_LABEL } from '@/lib/quotes/payment-state';
import { JobStatusBadge } from './job-status-badge';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';

/** The office's job list: filters, the table, and a form for a new job. */
export function JobsBoard() {
  const router = useRouter();
  const [filters, setFilters] = useState<Filters>({});
  const deferred = useDeferredValue(filters);
  const jobs = useQuery({ ...jobsQuery(deferred), placeholderData: keepPreviousData });
  const [creating, setCreating] = useState(false);

  return (
    <div className="space-y-6">
      <div className="flex justify-end">
        <Button
          onClick={() => setCreating((c) => !c)}
          variant={creating ? 'secondary' : 'primary'}
          aria-expanded={creating}
        >
          {creating ? 'Close' : 'New job'}
        </Button>
      </div>
      {creating && (
        <Card>
          <h2 className="mb-4 text-xl font-bold">New job</h2>
          <JobDetailsForm
            submitLabel="Create job"
            testId="new-job-form"
            save={createJobRequest}
            invalidates={[jobKeys.all]}
            onSaved={({ job }) => router.push(`/jobs/${job.id}`)}
          />
        </Card>
      )}
      <Card>
        <JobFilters value={filters} onChange={setFilters} />
        {jobs.error && <Notice tone="error">{jobs.error.message}</Notice>}
        {jobs.isPending && <p>Loading jobs…</p>}
        {jobs.data && jobs.data.length === 0 && (
          <p className="py-4 text-bark-soft">No jobs match these filters.</p>
        )}
        {jobs.data && jobs.data.length > 0 && (
          <ScrollRegion label="Jobs">
            <Table data-testid="jobs-table">
              <TableHead
                columns={[
                  'Reference',
                  'Customer',
                  'Due',
                  { label: 'Pieces', numeric: true },
                  'Status',
                  'Quote',
                ]}
              />
              <tbody>
                {jobs.data.map((job) => (
                  <TableRow key={job.id} className="hover:bg-sawdust">
                    <Cell className="font-semibold">
                      <Link href={`/jobs/${job.id}`} className="text-spruce underline">
                        {job.reference}
                      </Link>
                    </Cell>
                    <Cell>{job.customerName}</Cell>
                    <Cell className="tabular-nums">{job.dueDate ?? '—'}</Cell>
                    <Cell numeric>{job.pieceCount}</Cell>
                    <Cell>
                      <JobStatusBadge status={job.status} />
                    </Cell>
                    <Cell data-testid="job-quote-state">
                      {job.quoteNumber && job.paymentState
                        ? `${job.quoteNumber} · ${PAYMENT_STATE_LABEL[job.paymentState]}`
                        : '—'}
                    </Cell>
                  </TableRow>
                ))}
              </tbody>
            </Table>
          </ScrollRegion>
        )}
      </Card>
    </div>
  );
}
