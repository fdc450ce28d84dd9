import { expect, test } from '@playwright/test';
import { DEMO, signIn } from './support/sign-in';

const day = (offsetDays: number) => new Date(Date.now() + offsetDays * 86_400_000).toISOString().slice(0, 10);

test.describe('the owner runs the stock, the rack and the reports', () => {
  test('receives a delivery and sees the count on hand rise', async ({ page }) => {
    await signIn(page, DEMO.owner);
    await page.goto('/stock');
    const row = page.getByTestId('section-row-T47100');
    const chip = row.locator('li', { hasText: /^4\.8 m ·/ });
    const before = Number((await chip.innerText()).match(/(\d+) on hand/)![1]);

    const form = page.getByTestId('receive-form');
    await form.getByLabel('Delivery note or reference').fill('DN-5521 Northwood Timber');
    await form
      .getByLabel('Stock length, line 1')
      .selectOption({ label: `47×100 C24 treated — 4.8 m (${before} on hand)` });
    await form.getByLabel('Boards received, line 1').fill('12');
    await form.getByRole('button', { name: 'Receive delivery' }).click();
    await expect(page.getByTestId('receive-done')).toContainText('Received 12 boards');
    await expect(chip).toContainText(`${before + 12} on hand`);
    await expect(page.getByTestId('movements-table')).toContainText('DN-5521 Northwood Timber');
  });

  test('scraps the old offcuts the rack suggests clearing', async ({ page }) => {
    await signIn(page, DEMO.owner);
    await page.goto('/rack');
    await expect(page.getByTestId('rack-table')).toBeVisible();
    // The rack keeps the previous page on screen until the filtered one arrives: wait for that answer.
    const filtered = page.waitForResponse(
      (r) => r.url().includes('/api/offcuts?') && r.url().includes('minAgeDays=90'),
    );
    await page.getByTestId('rack-filters').getByLabel('Age').selectOption({ label: '90+ days (clear)' });
    const { total } = (await (await filtered).json()) as { total: number };
    await expect(page.getByTestId('rack-count')).toContainText(`of ${total} offcuts`);
    expect(total).toBeGreaterThan(0);
    expect(total).toBeLessThanOrEqual(50); // one page: choosing the page chooses them all

    await page.getByLabel('Choose every offcut on this page').check();
    await page.getByLabel('Reason for scrapping').fill('Rack clear-out: over 90 days');
    await page.getByRole('button', { name: 'Scrap chosen' }).click();
    await expect(page.getByTestId('rack-message')).toContainText(`Scrapped ${total} offcut`);
    await expect(page.getByTestId('rack-empty')).toBeVisible();
    await expect(page.getByRole('link', { name: 'Export CSV' })).toHaveAttribute('href', /minAgeDays=90/);
  });

  test('reads the reports for a date range, and an empty range explains itself', async ({ page }) => {
    await signIn(page, DEMO.owner);
    await page.goto('/reports');
    const range = page.getByTestId('report-range');
    await range.getByLabel('From').fill(day(-70));
    await range.getByLabel('To').fill(day(0));
    await range.getByRole('button', { name: 'Show' }).click();
    await expect(page).toHaveURL(new RegExp(`from=${day(-70)}&to=${day(0)}`));

    const weekly = page.getByTestId('report-waste-weekly');
    await expect(weekly.locator('svg.recharts-surface').first()).toBeVisible();
    await weekly.getByText('Show the figures').click();
    await expect(weekly.locator('tbody tr').first()).toBeVisible();
    await expect(page.getByTestId('report-headlines')).toContainText('Yield');
    await expect(page.getByTestId('report-savings')).toContainText('longest-first');
    const download = page.waitForEvent('download');
    await page.getByTestId('report-savings').getByRole('button', { name: 'Download CSV' }).click();
    expect((await download).suggestedFilename()).toBe('savings.csv');

    await page.goto('/reports?from=2020-01-06&to=2020-02-02');
    await expect(page.getByTestId('report-waste-weekly-empty')).toContainText('finished no boards');
    await expect(page.getByTestId('report-savings')).toContainText('No jobs were planned');
  });

  test('reports are the owner’s alone', async ({ page }) => {
    await signIn(page, DEMO.hand);
    await page.goto('/reports');
    await expect(page.getByTestId('access-denied')).toBeVisible();
    expect((await page.request.get(`/api/reports/waste?from=${day(-30)}&to=${day(0)}`)).status()).toBe(403);
  });
});
