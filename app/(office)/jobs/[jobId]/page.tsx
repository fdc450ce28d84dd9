import type { Metadata } from 'next';
import { JobWorkspace } from '@/components/jobs/job-workspace';
import { AccessDenied } from '@/components/layout/access-denied';
import { DisplayUnitProvider } from '@/components/units/display-unit';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Job' };

export default async function JobPage({ params }: { params: Promise<{ jobId: string }> }) {
  const user = await requirePageUser();
  if (!can(user.role, 'jobs:edit')) return <AccessDenied />;
  const [{ jobId }, yard] = await Promise.all([params, getYardSettings()]);
  return (
    <DisplayUnitProvider yardUnit={yard.displayUnit}>
      <JobWorkspace jobId={Number(jobId)} />
    </DisplayUnitProvider>
  );
}
