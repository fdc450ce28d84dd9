'use client';
// Released plans as big cards, soonest due first; refreshed every few seconds.
import Link from 'next/link';
import { useQuery } from '@tanstack/react-query';
import { Notice } from '@/components/ui/notice';
import { sawQueueQuery } from '@/lib/queries/saw';

export function SawQueue() {
  const { data: queue, error } = useQuery(sawQueueQuery());
  if (error) return <Notice tone="error">{error.message}</Notice>;
  if (!queue) return <p className="text-xl">Loading the queue…</p>;
  if (queue.length === 0) {
    return (
      <p
        className="rounded-xl border-2 border-dashed border-grain p-8 text-center text-lg text-bark-soft"
        data-testid="saw-queue-empty"
      >
        Nothing is released to the saw yet.
      </p>
    );
  }
  return (
    <ul className="grid gap-3 md:grid-cols-2" data-testid="saw-queue">
      {queue.map((q) => (
        <li key={q.planId}>
          <Link
            href={`/saw/${q.planId}`}
            data-testid={`queue-${q.reference}`}
            className="block min-h-24 rounded-xl border-2 border-bark bg-white p-4 active:bg-spruce-light"
          >
            <span className="flex items-baseline justify-between gap-2">
              <span className="text-2xl font-bold">{q.reference}</span>
              <span className="text-lg font-semibold">{q.dueDate ? `due ${q.dueDate}` : 'no due date'}</span>
            </span>
            <span className="block text-lg">{q.customerName}</span>
            <span className="block text-base text-bark-soft">{q.sections.join(' · ')}</span>
            <span className="mt-2 flex items-center gap-3">
              <progress className="h-4 flex-1 accent-spruce" max={q.boards} value={q.boardsDone} />
              <span className="font-bold">
                {q.boardsDone} of {q.boards} boards
              </span>
            </span>
            {q.officeFlag && <span className="mt-2 block font-semibold text-brick">⚑ {q.officeFlag}</span>}
          </Link>
        </li>
      ))}
    </ul>
  );
}
