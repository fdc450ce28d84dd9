import type { Metadata } from 'next';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getYardOverview } from '@/lib/yard/get-yard-overview';

export const metadata: Metadata = { title: 'Yard overview' };

export default async function OverviewPage() {
  await requirePageUser('reports:read');
  const overview = await getYardOverview();
  const figures = [
    { label: 'Open jobs', value: overview.openJobs },
    { label: 'Offcuts on the rack', value: overview.rackOffcuts },
    { label: 'Metres on the rack', value: overview.rackMetres.toFixed(1) },
    { label: 'Sections stocked', value: overview.sections },
  ];
  return (
    <>
      <PageHeader title="Yard overview" lead="Where the yard stands today." />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4" data-testid="yard-overview">
        {figures.map((f) => (
          <Card key={f.label}>
            <p className="text-sm font-semibold text-bark-soft">{f.label}</p>
            <p className="mt-1 text-4xl font-bold text-spruce-dark">{f.value}</p>
          </Card>
        ))}
      </div>
    </>
  );
}
