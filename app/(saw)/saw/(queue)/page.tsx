import type { Metadata } from 'next';
import Link from 'next/link';
import { PageHeader } from '@/components/ui/page-header';
import { SafetyLine } from '@/components/saw/safety-line';
import { SawQueue } from '@/components/saw/saw-queue';

export const metadata: Metadata = { title: 'Saw queue' };

export default function SawQueuePage() {
  return (
    <div className="space-y-4">
      <PageHeader
        title="Saw queue"
        lead="Released plans, soonest due first."
        actions={
          <Link
            href="/saw/find"
            className="inline-flex min-h-12 items-center rounded-lg border-2 border-grain bg-white px-4 font-semibold"
          >
            Find an offcut
          </Link>
        }
      />
      <SafetyLine />
      <SawQueue />
    </div>
  );
}
