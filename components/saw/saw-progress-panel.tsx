'use client';
// The office's live view of the saw: every released plan with its progress, refreshed every 5 s.
import { useQuery } from '@tanstack/react-query';
import { sawQueueQuery } from '@/lib/queries/saw';

export function SawProgressPanel() {
  const { data: queue } = useQuery(sawQueueQuery());
  if (!queue || queue.length === 0) return null;
  return (
    <section
      className="mb-6 rounded-xl border-2 border-shaving bg-white p-4"
      aria-label="At the saw"
      data-testid="saw-progress-panel"
    >
      <h2 className="mb-2 text-lg font-bold">At the saw now</h2>
      <ul className="space-y-2">
        {queue.map((q) => (
          <li
            key={q.planId}
            className="flex flex-wrap items-center gap-3"
            data-testid={`saw-progress-${q.reference}`}
          >
            <span className="w-20 font-semibold">{q.reference}</span>
            <span className="flex-1">{q.customerName}</span>
            <progress className="h-3 w-32 accent-spruce" max={q.boards} value={q.boardsDone} />
            <span className="font-semibold">
              {q.boardsDone} of {q.boards} boards cut
            </span>
            {q.officeFlag && <span className="w-full font-semibold text-brick">⚑ {q.officeFlag}</span>}
          </li>
        ))}
      </ul>
    </section>
  );
}
