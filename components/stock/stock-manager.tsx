'use client';

import { useQuery } from '@tanstack/react-query';
import { Card } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { DisplayUnit, Region } from '@/db/enums';
import { sectionsQuery } from '@/lib/queries/sections';
import { ReceiveForm } from './receive-form';
import { RecentMovements } from './recent-movements';
import { SectionsCatalogue } from './sections-catalogue';
import { StocktakeForm } from './stocktake-form';

export function StockManager({
  unit,
  region,
  canEditSections,
  canReceive,
  canAdjust,
}: {
  unit: DisplayUnit;
  region: Region;
  canEditSections: boolean;
  canReceive: boolean;
  canAdjust: boolean;
}) {
  const sections = useQuery(sectionsQuery());
  if (sections.error) return <Notice tone="error">{sections.error.message}</Notice>;
  if (!sections.data) return <p>Loading the catalogue…</p>;
  return (
    <div className="space-y-8">
      {(canReceive || canAdjust) && (
        <div className="grid gap-6 lg:grid-cols-2">
          {canReceive && (
            <Card>
              <h2 className="mb-4 text-xl font-bold">Receive a delivery</h2>
              <ReceiveForm sections={sections.data} region={region} />
            </Card>
          )}
          {canAdjust && (
            <Card>
              <h2 className="mb-4 text-xl font-bold">Stocktake</h2>
              <StocktakeForm sections={sections.data} region={region} />
            </Card>
          )}
        </div>
      )}
      <section>
        <h2 className="mb-3 text-xl font-bold">Sections catalogue</h2>
        <SectionsCatalogue sections={sections.data} unit={unit} region={region} canEdit={canEditSections} />
      </section>
      {canReceive && (
        <section>
          <h2 className="mb-3 text-xl font-bold">Recent deliveries and counts</h2>
          <RecentMovements unit={unit} />
        </section>
      )}
    </div>
  );
}
