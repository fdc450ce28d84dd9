import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { FrameScheduleEditor } from '@/components/frames/frame-schedule-editor';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { AppError } from '@/lib/errors';
import { getFrameScheduleById } from '@/lib/frames-data/frame-schedules';
import { getYardFrameSections } from '@/lib/frames-data/get-yard-frame-sections';
import { listJobsOpenForFrames } from '@/lib/frames-data/send-schedule-to-job';

export const metadata: Metadata = { title: 'Frame schedule' };

export default async function FrameSchedulePage({ params }: { params: Promise<{ scheduleId: string }> }) {
  await requirePageUser('frames:edit');
  const id = Number((await params).scheduleId);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  const [schedule, sections, openJobs] = await Promise.all([
    getFrameScheduleById({ id }).catch((e: unknown) =>
      e instanceof AppError && e.code === 'not_found' ? null : Promise.reject(e),
    ),
    getYardFrameSections(),
    listJobsOpenForFrames(),
  ]);
  if (!schedule) notFound();
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
      />
    </>
  );
}
