import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { OffcutFinder } from '@/components/saw/offcut-finder';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Find an offcut' };

export default async function FindOffcutPage() {
  const yard = await getYardSettings();
  return (
    <>
      <PageHeader title="Find an offcut" lead="Scan the QR code on its label, or type its tag." />
      <OffcutFinder unit={yard.displayUnit} />
    </>
  );
}
