import type { Metadata } from 'next';
import { JobWorkspace } from '@/components/jobs/job-workspace';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { jobOrNotFound } from '@/lib/pages/page-records';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Job' };

export default async function JobPage({ params }: { params: Promise<{ jobId: string }> }) {
  await requirePageUser('jobs:edit');
  const [{ jobId }, yard] = await Promise.all([params, getYardSettings()]);
  const { job } = await jobOrNotFound(jobId);
  return (
    <DisplayUnitProvider yardUnit={yard.displayUnit}>
      <JobWorkspace jobId={job.id} />
    </DisplayUnitProvider>
  );
}
