import type { Metadata } from 'next';
import Link from 'next/link';
import { OverviewTile } from '@/components/yard/overview-tile';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getYardOverview } from '@/lib/yard/get-yard-overview';

export const metadata: Metadata = { title: 'Yard overview' };

export default async function OverviewPage() {
  await requirePageUser('reports:read');
  const o = await getYardOverview();
  const tiles = [
    { id: 'due', label: 'Jobs due today or late', value: o.dueToday, href: '/jobs' },
    { id: 'saw', label: 'Jobs at the saw', value: o.atSaw, href: '/saw' },
    { id: 'short', label: 'Stock lengths short for released jobs', value: o.shortStock, href: '/stock' },
    {
      id: 'clear',
      label: `Offcuts older than ${o.clearAfterDays} days to clear`,
      value: o.offcutsToClear,
      href: `/rack?minAgeDays=${o.clearAfterDays}`,
    },
    { id: 'flags', label: 'Flags for the owner', value: o.flags.length, href: '#flags' },
  ];
  return (
    <>
      <PageHeader
        title="Yard overview"
        lead="What needs doing today. Each figure opens the page behind it."
      />
      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-5" data-testid="yard-overview">
        {tiles.map((t) => (
          <li key={t.id}>
            <OverviewTile {...t} />
          </li>
        ))}
      </ul>
      <section id="flags" className="mt-8 space-y-3" aria-labelledby="flags-heading">
        <h2 id="flags-heading" className="text-2xl font-bold">
          Flags
        </h2>
        {o.flags.length === 0 ? (
          <p>Nothing is flagged.</p>
        ) : (
          <ul className="space-y-2" data-testid="owner-flags">
            {o.flags.map((f) => (
              <li key={f.key}>
                <Card className="border-amber">
                  <Link href={f.href} className="font-semibold text-spruce underline">
                    {f.text}
                  </Link>
                </Card>
              </li>
            ))}
          </ul>
        )}
      </section>
      <p className="mt-8 text-bark-soft">
        On the rack: {o.rackOffcuts} offcuts, {o.rackMetres.toFixed(1)} m in all.
      </p>
    </>
  );
}
