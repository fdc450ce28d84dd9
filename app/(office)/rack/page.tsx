import type { Metadata } from 'next';
import { RackManager } from '@/components/yard/rack-manager';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { listSections } from '@/lib/stock/list-sections';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Offcut rack' };

export default async function RackPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const user = await requirePageUser('offcuts:read');
  const [settings, sections, params] = await Promise.all([getYardSettings(), listSections(), searchParams]);
  const minAgeDays = params.minAgeDays && /^\d+$/.test(params.minAgeDays) ? params.minAgeDays : undefined;
  return (
    <>
      <PageHeader
        title="Offcut rack"
        lead={`Every offcut the yard holds. Pieces older than ${settings.clearOffcutsAfterDays} days are suggested for clearing.`}
      />
      <RackManager
        unit={settings.displayUnit}
        clearAfterDays={settings.clearOffcutsAfterDays}
        canEdit={can(user.role, 'offcuts:edit')}
        sections={sections.map((s) => ({ id: s.id, name: s.name }))}
        initial={minAgeDays ? { minAgeDays } : undefined}
      />
    </>
  );
}
