import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Saw queue' };

export default function SawQueuePage() {
  return (
    <>
      <PageHeader title="Saw queue" lead="Released plans, soonest due first." />
      <p className="rounded-xl border-2 border-dashed border-grain p-8 text-center text-lg text-bark-soft" data-testid="saw-queue-empty">
        Nothing is released to the saw yet.
      </p>
    </>
  );
}
