import type { Metadata } from 'next';
import { FrameScheduleEditor } from '@/components/frames/frame-schedule-editor';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getYardFrameSections } from '@/lib/frames-data/get-yard-frame-sections';
import { listJobsOpenForFrames } from '@/lib/frames-data/send-schedule-to-job';
import { frameScheduleOrNotFound } from '@/lib/pages/page-records';

export const metadata: Metadata = { title: 'Frame schedule' };

export default async function FrameSchedulePage({ params }: { params: Promise<{ scheduleId: string }> }) {
  await requirePageUser('frames:edit');
  const [schedule, sections, openJobs] = await Promise.all([
    params.then((p) => frameScheduleOrNotFound(p.scheduleId)),
    getYardFrameSections(),
    listJobsOpenForFrames(),
  ]);
  return (
    <>
      <PageHeader
        title={schedule.name}
        lead={schedule.customerName ? `For ${schedule.customerName}` : 'Frame schedule'}
      />
      <FrameScheduleEditor
        key={schedule.id}
        schedule={schedule}
        sections={sections.list.filter((s) => s.active)}
        openJobs={openJobs}
        rules={{ region: sections.context.region, minPieceMm: sections.context.minPieceMm }}
      />
    </>
  );
}
