import { expect, test, type APIRequestContext } from '@playwright/test';
import { acceptAndPayDeposit } from './support/payments';
import { DEMO, signIn } from './support/sign-in';

type Board = { source: 'stock' | 'offcut'; offcutId: number | null; lengthMm: number; sectionId: number };

async function jobWithOnePiece(request: APIRequestContext, customerName: string, lengthMm: number) {
  const { job } = await (await request.post('/api/jobs', { data: { customerName } })).json();
  const imported = await request.post(`/api/jobs/${job.id}/items/import`, {
    data: `section,length,quantity,label\nT47100,${lengthMm},1,gate rail`,
    headers: { 'content-type': 'text/csv' },
  });
  expect(imported.status()).toBe(200);
  return job.id as number;
}

async function plan(request: APIRequestContext, jobId: number) {
  const response = await request.post(`/api/jobs/${jobId}/plans`, { data: { timeLimitMs: 300 } });
  expect(response.status()).toBe(201);
  return (await response.json()) as { id: number; boards: Board[] };
}

test('two plans want the same rack offcut: one release wins, the other names the offcut and plans again', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await signIn(page, DEMO.hand);
  const request = page.request;
  // A short piece goes on a rack offcut (free) before new stock; a piece exactly that offcut's length
  // fits it with no scrap, so two such jobs both plan onto the same offcut.
  const probe = await plan(request, await jobWithOnePiece(request, 'Probe', 300));
  const offcut = probe.boards.find((b) => b.source === 'offcut');
  expect(offcut).toBeTruthy();
  const [a, b] = [
    await jobWithOnePiece(request, 'Hollis Vane', offcut!.lengthMm),
    await jobWithOnePiece(request, 'Marta Quill', offcut!.lengthMm),
  ];
  const [planA, planB] = [await plan(request, a), await plan(request, b)];
  expect(planA.boards[0].offcutId).toBe(offcut!.offcutId);
  expect(planB.boards[0].offcutId).toBe(offcut!.offcutId);

  // Both customers accept and pay, so only the offcut stands between them.
  for (const p of [planA, planB]) await acceptAndPayDeposit(request, p.id);
  const results = await Promise.all([planA, planB].map((p) => request.post(`/api/plans/${p.id}/release`)));
  expect(results.map((r) => r.status()).sort()).toEqual([200, 409]);
  const loser = results[0].status() === 409 ? planA : planB;

  await page.goto(`/plans/${loser.id}`);
  await page.getByRole('button', { name: 'Release to the saw' }).click();
  const error = page.getByTestId('release-error');
  await expect(error).toContainText('no longer on the rack');
  await expect(error).toContainText('(reserved)');
  await error.getByRole('button', { name: 'Plan again with what is on the rack now' }).click();
  await expect(page).toHaveURL(new RegExp(`/plans/(?!${loser.id}$)\\d+$`), { timeout: 60_000 });
  // The new plan is a new quote version: the customer accepts it before it goes to the saw.
  await acceptAndPayDeposit(request, Number(page.url().split('/').pop()));
  await page.getByRole('button', { name: 'Release to the saw' }).click();
  await expect(page.getByText('Released to the saw')).toBeVisible();
});
