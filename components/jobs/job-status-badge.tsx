import type { JobStatus } from '@/db/enums';
import { cn } from '@/lib/cn';

const tones: Record<JobStatus, string> = {
  draft: 'bg-shaving text-bark',
  planned: 'bg-spruce-light text-spruce-dark',
  released: 'bg-spruce text-white',
  cutting: 'bg-amber-light text-bark',
  done: 'bg-bark text-white',
  cancelled: 'bg-brick-light text-brick line-through',
};

export function JobStatusBadge({ status }: { status: JobStatus }) {
  return (
    <span className={cn('inline-block rounded-full px-3 py-0.5 text-sm font-semibold', tones[status])}>
      {status}
    </span>
  );
}
