import Link from 'next/link';
import { ScrollRegion } from '@/components/ui/scroll-region';
import type { listFrameSchedules } from '@/lib/frames-data/frame-schedules';

type Row = Awaited<ReturnType<typeof listFrameSchedules>>[number];

/** Saved frame schedules, latest first, with the jobs made from each. */
export function ScheduleList({ schedules }: { schedules: Row[] }) {
  if (schedules.length === 0) return <p className="p-4 text-bark-soft">No frame schedules yet.</p>;
  return (
    <ScrollRegion label="Frame schedules">
      <table className="w-full text-left" data-testid="schedule-list">
        <thead className="bg-shaving text-sm">
          <tr>
            <th className="p-3">Schedule</th>
            <th className="p-3">Customer</th>
            <th className="p-3 text-right">Panels</th>
            <th className="p-3">Jobs</th>
            <th className="p-3">Changed</th>
          </tr>
        </thead>
        <tbody>
          {schedules.map((s) => (
            <tr key={s.id} className="border-t border-shaving">
              <td className="p-3">
                <Link href={`/frames/${s.id}`} className="font-semibold text-spruce underline">
                  {s.name}
                </Link>
              </td>
              <td className="p-3">{s.customerName}</td>
              <td className="p-3 text-right">{s.panelCount}</td>
              <td className="p-3">{s.jobReferences.join(', ') || '—'}</td>
              <td className="p-3 text-sm">{s.updatedAt.slice(0, 10)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
