import type { Metadata } from 'next';
import { JobsBoard } from '@/components/jobs/jobs-board';
import { PageHeader } from '@/components/ui/page-header';
import { SawProgressPanel } from '@/components/saw/saw-progress-panel';
import { requirePageUser } from '@/lib/auth/page-user';

export const metadata: Metadata = { title: 'Jobs' };

export default async function JobsPage() {
  await requirePageUser('jobs:edit');
  return (
    <>
      <PageHeader title="Jobs" lead="Open jobs, soonest due first. Done and cancelled jobs are under Show." />
      <SawProgressPanel />
      <JobsBoard />
    </>
  );
}
