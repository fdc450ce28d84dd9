import { recordGateLayout } from '@/lib/pages/feature-gate';
import { planOrNotFound } from '@/lib/pages/page-records';

export default recordGateLayout('planId', planOrNotFound);
