import type { Metadata } from 'next';
import Link from 'next/link';
import { Notice } from '@/components/ui/notice';
import { OffcutLabel } from '@/components/saw/offcut-label';
import { PrintButton } from '@/components/saw/print-button';
import { requirePageUser } from '@/lib/auth/page-user';
import { getOffcutsForLabels, getOffcutsMadeByPlan } from '@/lib/saw/find-offcut';
import { offcutIdsQuerySchema } from '@/lib/validations/saw';
import { getYardSettings } from '@/lib/yard/get-yard-settings';
import { cn } from '@/lib/cn';
import './labels.css';

export const metadata: Metadata = { title: 'Offcut labels' };

type Search = { ids?: string; plan?: string; format?: string };

const PAGE_SIZE = {
  roll: '@page { size: 62mm 29mm; margin: 0; }',
  a4: '@page { size: A4; margin: 15mm 7mm; }',
};

export default async function OffcutLabelsPage({ searchParams }: { searchParams: Promise<Search> }) {
  await requirePageUser('offcuts:label');
  const search = await searchParams;
  const format = search.format === 'a4' ? 'a4' : 'roll';
  const ids = offcutIdsQuerySchema.safeParse(search.ids ?? '');
  const planId = Number(search.plan);
  const [offcuts, yard] = await Promise.all([
    ids.success
      ? getOffcutsForLabels({ ids: ids.data })
      : Number.isSafeInteger(planId) && planId > 0
        ? getOffcutsMadeByPlan({ planId })
        : [],
    getYardSettings(),
  ]);
  const query = search.ids ? `ids=${search.ids}` : `plan=${search.plan ?? ''}`;
  const tab = (f: 'roll' | 'a4', text: string) => (
    <Link
      href={`/labels/offcuts?${query}&format=${f}`}
      aria-current={format === f ? 'page' : undefined}
      className={cn(
        'inline-flex min-h-12 items-center rounded-lg border-2 px-4 font-semibold',
        format === f ? 'border-spruce bg-spruce text-white' : 'border-grain bg-white',
      )}
    >
      {text}
    </Link>
  );
  return (
    <main id="main-content" tabIndex={-1} className="mx-auto max-w-5xl p-4">
      <style>{PAGE_SIZE[format]}</style>
      <div className="no-print mb-6 flex flex-wrap items-center gap-3">
        <Link
          href="/"
          className="inline-flex min-h-12 items-center rounded-lg border-2 border-grain bg-white px-4 font-semibold"
        >
          ‹ Back
        </Link>
        <h1 className="flex-1 text-2xl font-bold">Offcut labels ({offcuts.length})</h1>
        {tab('roll', 'Label printer 62 × 29 mm')}
        {tab('a4', 'A4 sheet, 21 per page')}
        <PrintButton />
      </div>
      {offcuts.length === 0 ? (
        <Notice tone="warning">No offcuts to label. Give their ids, e.g. /labels/offcuts?ids=1,2,3.</Notice>
      ) : (
        <div className={format === 'a4' ? 'labels-a4' : 'labels-roll'} data-testid="label-sheet">
          {offcuts.map((o) => (
            <OffcutLabel key={o.id} offcut={o} unit={yard.displayUnit} />
          ))}
        </div>
      )}
    </main>
  );
}
