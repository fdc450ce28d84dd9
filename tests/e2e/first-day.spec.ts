// What a new yard team tripped over on their first day, each checked where they met it.
import { expect, test } from '@playwright/test';
import { findDemoIds, type DemoIds } from './support/demo-ids';
import { DEMO, signIn } from './support/sign-in';

let ids: DemoIds;

test.beforeAll(async ({ browser }) => {
  const page = await browser.newPage();
  await signIn(page, DEMO.owner);
  ids = await findDemoIds(page);
  await page.close();
});

test('the plan page says its gap in money and compares new timber with new timber', async ({ page }) => {
  await signIn(page, DEMO.hand);
  await page.goto(`/plans/${ids.planId}`);
  const gap = page.getByTestId('plan-gap');
  await expect(gap).toContainText(/^(Cheapest possible|At most £\d+\.\d\d cheaper is possible)/);
  await expect(gap).not.toContainText('better is possible');
  const baseline = page.getByTestId('plan-baseline');
  await expect(baseline).toContainText('New timber bought');
  await expect(baseline).toContainText('Longest-first, new stock only');
  await expect(page.getByTestId('plan-baseline-saving')).toContainText(
    /new timber than longest-first|as much/,
  );
});

test('the job list shows open jobs first, with done and cancelled ones behind a filter', async ({ page }) => {
  await signIn(page, DEMO.hand);
  const table = page.getByTestId('jobs-table');
  await expect(table).toContainText('J-1001');
  // J-1004 is cancelled in the demo yard.
  await expect(table).not.toContainText('J-1004');
  await page.getByTestId('job-show').selectOption('closed');
  await expect(table).toContainText('J-1004');
  await expect(table).not.toContainText('J-1001');
  await page.getByTestId('job-show').selectOption('all');
  const statuses = await table.locator('tbody tr td:last-child').allTextContents();
  const closed = statuses.map((s) => /done|cancelled/.test(s));
  expect(closed).toEqual([...closed].sort((a, b) => Number(a) - Number(b)));
});

test('cancelling a job sits with its details and asks first', async ({ page }) => {
  await signIn(page, DEMO.hand);
  await page.goto(`/jobs/${ids.jobId}`);
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  await expect(page.getByRole('button', { name: /^Cancel/ })).toHaveCount(0);
  await page.getByRole('button', { name: 'Edit details' }).click();
  await page.getByTestId('cancel-job').click();
  await page.getByRole('button', { name: 'Keep the job' }).click();
  await expect(page.getByTestId('cancel-job')).toBeVisible();
  await expect(page.getByText('cancelled', { exact: true })).toHaveCount(0);
});
