import type { Metadata } from 'next';
import { NewScheduleForm } from '@/components/frames/new-schedule-form';
import { ScheduleList } from '@/components/frames/schedule-list';
import { StructureNotice } from '@/components/frames/structure-notice';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { listFrameSchedules } from '@/lib/frames-data/frame-schedules';

export const metadata: Metadata = { title: 'Frame schedules' };

export default async function FramesPage() {
  await requirePageUser('frames:edit');
  const schedules = await listFrameSchedules();
  return (
    <div className="space-y-6">
      <PageHeader
        title="Frame schedules"
        lead="Describe a shed, lean-to or stud wall panel by panel and get its cut list."
      />
      <Card>
        <h2 className="mb-3 text-xl font-bold">New schedule</h2>
        <NewScheduleForm />
      </Card>
      <Card className="p-0">
        <ScheduleList schedules={schedules} />
      </Card>
      <StructureNotice />
    </div>
  );
}
