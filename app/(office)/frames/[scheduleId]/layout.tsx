import { recordGateLayout } from '@/lib/pages/feature-gate';
import { frameScheduleOrNotFound } from '@/lib/pages/page-records';

export default recordGateLayout('scheduleId', frameScheduleOrNotFound);
