'use client';
// Live saw progress of one plan for the office: "n of m boards cut", refreshed every 5 s.
import { useQuery } from '@tanstack/react-query';
import { planProgressQuery } from '@/lib/queries/saw';

export function PlanProgress({ planId }: { planId: number }) {
  const { data } = useQuery(planProgressQuery(planId));
  if (!data) return <span className="text-bark-soft">…</span>;
  return (
    <span className="inline-flex items-center gap-2" data-testid={`plan-progress-${planId}`}>
      <progress className="h-3 w-24 accent-spruce" max={data.boards} value={data.boardsDone} />
      <span className="font-semibold">
        {data.boardsDone} of {data.boards} boards cut
      </span>
    </span>
  );
}
