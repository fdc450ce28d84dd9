import type { Metadata } from 'next';
import Link from 'next/link';
import { JobsBoard } from '@/components/jobs/jobs-board';
import { PageHeader } from '@/components/ui/page-header';
import { SawProgressPanel } from '@/components/saw/saw-progress-panel';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Jobs' };

export default async function JobsPage() {
  const user = await requirePageUser('jobs:edit');
  return (
    <>
      <PageHeader
        title="Jobs"
        lead="Open jobs, soonest due first. Done and cancelled jobs are under Show."
        actions={
          can(user.role, 'mail:outbox') ? (
            <Link href="/outbox" className="font-semibold text-spruce underline">
              Outbox: sent cut sheets
            </Link>
          ) : undefined
        }
      />
      <SawProgressPanel />
      <JobsBoard />
    </>
  );
}
