import type { Metadata } from 'next';
import { StockManager } from '@/components/stock/stock-manager';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Stock' };

export default async function StockPage() {
  const user = await requirePageUser('stock:receive');
  const settings = await getYardSettings();
  return (
    <>
      <PageHeader
        title="Stock"
        lead="Sections and stock lengths the yard sells, deliveries in and counted stock. Every change is kept as a stock movement."
      />
      <StockManager
        unit={settings.displayUnit}
        region={settings.region}
        canEditSections={can(user.role, 'sections:edit')}
        canReceive={can(user.role, 'stock:receive')}
        canAdjust={can(user.role, 'stock:adjust')}
      />
    </>
  );
}
