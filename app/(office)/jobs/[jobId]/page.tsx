import type { Metadata } from 'next';
import { JobWorkspace } from '@/components/jobs/job-workspace';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { getJobById } from '@/lib/jobs/get-job';
import { findOrNotFound } from '@/lib/pages/find-or-not-found';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Job' };

export default async function JobPage({ params }: { params: Promise<{ jobId: string }> }) {
  await requirePageUser('jobs:edit');
  const [{ jobId }, yard] = await Promise.all([params, getYardSettings()]);
  // Checked here, so a wrong address shows the not-found page and the client never asks for it.
  const { job } = await findOrNotFound(jobId, (id) => getJobById({ jobId: id }));
  return (
    <DisplayUnitProvider yardUnit={yard.displayUnit}>
      <JobWorkspace jobId={job.id} />
    </DisplayUnitProvider>
  );
}
