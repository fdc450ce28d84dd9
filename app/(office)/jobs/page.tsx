import type { Metadata } from 'next';
import { AccessDenied } from '@/components/layout/access-denied';
import { PageHeader } from '@/components/ui/page-header';
import { SawProgressPanel } from '@/components/saw/saw-progress-panel';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { listJobsBrief } from '@/lib/jobs/list-jobs-brief';

export const metadata: Metadata = { title: 'Jobs' };

export default async function JobsPage() {
  const user = await requirePageUser();
  if (!can(user.role, 'jobs:edit')) return <AccessDenied />;
  const jobs = await listJobsBrief();
  return (
    <>
      <PageHeader title="Jobs" lead="Customer cut lists, soonest due first." />
      <SawProgressPanel />
      <table className="w-full overflow-hidden rounded-xl bg-white text-left" data-testid="jobs-table">
        <thead className="bg-shaving text-sm">
          <tr>
            <th className="p-3">Reference</th>
            <th className="p-3">Customer</th>
            <th className="p-3">Due</th>
            <th className="p-3">Status</th>
          </tr>
        </thead>
        <tbody>
          {jobs.map((job) => (
            <tr key={job.id} className="border-t border-shaving">
              <td className="p-3 font-semibold">{job.reference}</td>
              <td className="p-3">{job.customerName}</td>
              <td className="p-3">{job.dueDate}</td>
              <td className="p-3">{job.status}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
