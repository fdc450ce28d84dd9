// The records behind page addresses, read once per request: the id segment's layout.tsx checks the
// record exists (404) and the page below it reuses the same read.
import 'server-only';
import { cache } from 'react';
import { getFrameScheduleById } from '@/lib/frames-data/frame-schedules';
import { getJobById } from '@/lib/jobs/get-job';
import { getPlanContext } from '@/lib/plans/get-plan-context';
import { getSawPlan } from '@/lib/saw/get-saw-plan';
import { findOrNotFound } from './find-or-not-found';

export const jobOrNotFound = cache((rawId: string) =>
  findOrNotFound(rawId, (jobId) => getJobById({ jobId })),
);

/** An office plan: its id and what the plan page shows beside it. */
export const planOrNotFound = cache((rawId: string) =>
  findOrNotFound(rawId, async (planId) => ({ id: planId, context: await getPlanContext({ planId }) })),
);

export const frameScheduleOrNotFound = cache((rawId: string) =>
  findOrNotFound(rawId, (id) => getFrameScheduleById({ id })),
);

/** A plan as the saw shows it: released or done plans only. */
export const sawPlanOrNotFound = cache((rawId: string) =>
  findOrNotFound(rawId, (planId) => getSawPlan({ planId })),
);
