import { expect, type APIRequestContext, type Page } from '@playwright/test';

export type DemoIds = {
  jobId: number;
  planId: number;
  otherPlanId: number;
  sawPlanId: number;
  scheduleId: number;
};

async function json<T>(request: APIRequestContext, url: string): Promise<T> {
  // A kept-alive connection the server closes just as it is reused answers ECONNRESET; a GET may ask again.
  const response = await request.get(url, { maxRetries: 1 });
  expect(response.ok(), url).toBe(true);
  return (await response.json()) as T;
}

/** Finds real ids in the demo yard: a planned job, its plan and another, the released plan, a schedule. */
export async function findDemoIds(page: Page): Promise<DemoIds> {
  const { jobs } = await json<{ jobs: { id: number; reference: string }[] }>(
    page.request,
    '/api/jobs?show=all',
  );
  const planOf = async (reference: string) => {
    const job = jobs.find((j) => j.reference === reference)!;
    const detail = await json<{ plans: { id: number }[] }>(page.request, `/api/jobs/${job.id}`);
    return { jobId: job.id, planId: detail.plans[0].id };
  };
  const [released, planned] = await Promise.all([planOf('J-1002'), planOf('J-1003')]);
  const { queue } = await json<{ queue: { planId: number }[] }>(page.request, '/api/saw/queue');
  const { schedules } = await json<{ schedules: { id: number }[] }>(page.request, '/api/frames');
  return {
    jobId: planned.jobId,
    planId: planned.planId,
    otherPlanId: released.planId,
    sawPlanId: queue[0].planId,
    scheduleId: schedules[0].id,
  };
}
