import { recordGateLayout } from '@/lib/pages/feature-gate';
import { jobOrNotFound } from '@/lib/pages/page-records';

export default recordGateLayout('jobId', jobOrNotFound);
