import { recordGateLayout } from '@/lib/pages/feature-gate';
import { sawPlanOrNotFound } from '@/lib/pages/page-records';

export default recordGateLayout('planId', sawPlanOrNotFound);
