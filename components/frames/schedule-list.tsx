import Link from 'next/link';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import type { listFrameSchedules } from '@/lib/frames-data/frame-schedules';

type Row = Awaited<ReturnType<typeof listFrameSchedules>>[number];

/** Saved frame schedules, latest first, with the jobs made from each. */
export function ScheduleList({ schedules }: { schedules: Row[] }) {
  if (schedules.length === 0) return <p className="p-4 text-bark-soft">No frame schedules yet.</p>;
  return (
    <ScrollRegion label="Frame schedules">
      <Table data-testid="schedule-list">
        <TableHead
          columns={['Schedule', 'Customer', { label: 'Panels', numeric: true }, 'Jobs', 'Changed']}
        />
        <tbody>
          {schedules.map((s) => (
            <TableRow key={s.id}>
              <Cell>
                <Link href={`/frames/${s.id}`} className="font-semibold text-spruce underline">
                  {s.name}
                </Link>
              </Cell>
              <Cell>{s.customerName}</Cell>
              <Cell numeric>{s.panelCount}</Cell>
              <Cell>{s.jobReferences.join(', ') || '—'}</Cell>
              <Cell className="text-sm">{s.updatedAt.slice(0, 10)}</Cell>
            </TableRow>
          ))}
        </tbody>
      </Table>
    </ScrollRegion>
  );
}
