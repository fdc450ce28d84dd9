import type { Metadata } from 'next';
import { AccessDenied } from '@/components/layout/access-denied';
import { NewScheduleForm } from '@/components/frames/new-schedule-form';
import { ScheduleList } from '@/components/frames/schedule-list';
import { StructureNotice } from '@/components/frames/structure-notice';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { listFrameSchedules } from '@/lib/frames-data/frame-schedules';

export const metadata: Metadata = { title: 'Frame schedules' };

export default async function FramesPage() {
  const user = await requirePageUser();
  if (!can(user.role, 'frames:edit')) return <AccessDenied />;
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
