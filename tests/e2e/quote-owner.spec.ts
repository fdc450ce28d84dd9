import { expect, test, type APIRequestContext } from '@playwright/test';
import { acceptAndPayDeposit } from './support/payments';
import { DEMO, signIn } from './support/sign-in';

// The yard hand picks or adds a customer on the job form; the owner follows the money (refunds,
// quotes awaiting acceptance), edits how a section is sold and reads the margin at cost.

const DATE_AS_WRITTEN = /\d{1,2} (Jan|Feb|Mar|Apr|May|Jun|Jul|Aug|Sep|Oct|Nov|Dec) \d{4}/;

async function plannedJob(request: APIRequestContext, name: string) {
  const customer = await (await request.post('/api/customers', { data: { name, account: 'retail' } })).json();
  const { job } = await (await request.post('/api/jobs', { data: { customerId: customer.id } })).json();
  const { sections } = await (await request.get('/api/sections')).json();
  const section = sections.find((s: { code: string }) => s.code === 'T47100');
  await request.post(`/api/jobs/${job.id}/items`, {
    data: { sectionId: section.id, length: '1800', quantity: 4, label: 'post' },
  });
  const plan = await request.post(`/api/jobs/${job.id}/plans`, { data: { useOffcuts: false } });
  expect(plan.status()).toBe(201);
  const planId = (await plan.json()).id as number;
  expect((await request.get(`/api/plans/${planId}`)).status()).toBe(200); // prices its quote
  return { job, planId };
}

test('the job form finds a customer record or makes a new one inline', async ({ page }) => {
  await signIn(page, DEMO.hand);
  await page.request.post('/api/customers', { data: { name: 'Orrin Blackwood', account: 'retail' } });
  await page.goto('/jobs');

  await page.getByRole('button', { name: 'New job' }).click();
  let form = page.getByTestId('new-job-form');
  await form.getByLabel('Find a customer').fill('Tamsin Wolde');
  await expect(form.getByLabel('Customer', { exact: true })).toHaveValue('new');
  const fresh = form.getByTestId('new-customer-fields');
  await expect(fresh.getByLabel('Customer name')).toHaveValue('Tamsin Wolde');
  await fresh.getByLabel('Account').selectOption('trade');
  await fresh.getByLabel('Customer phone').fill('01632 960 333');
  await page.screenshot({ path: 'test-results/new-job-customer-picker.png', fullPage: true });
  await form.getByRole('button', { name: 'Create job' }).click();
  await expect(page).toHaveURL(/\/jobs\/\d+$/);
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Tamsin Wolde');
  const made = (await (await page.request.get('/api/customers?q=Tamsin')).json()).customers;
  expect(made).toEqual([expect.objectContaining({ account: 'trade', phone: '01632 960 333' })]);

  await page.goto('/jobs');
  await page.getByRole('button', { name: 'New job' }).click();
  form = page.getByTestId('new-job-form');
  await form.getByLabel('Find a customer').fill('Orrin');
  await expect(form.getByLabel('Customer', { exact: true })).toHaveValue(/^\d+$/);
  await expect(form.getByTestId('new-customer-fields')).toHaveCount(0);
  await form.getByRole('button', { name: 'Create job' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Orrin Blackwood');
  const jobId = page.url().split('/').pop();
  const { job } = await (await page.request.get(`/api/jobs/${jobId}`)).json();
  const [orrin] = (await (await page.request.get('/api/customers?q=Orrin')).json()).customers;
  expect(job.customerId).toBe(orrin.id);
});

test('the owner refunds a cancelled paid job and sees quotes awaiting acceptance', async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  await signIn(page, DEMO.hand);
  const paid = await plannedJob(page.request, 'Ffion Refund');
  await acceptAndPayDeposit(page.request, paid.planId);
  const waiting = await plannedJob(page.request, 'Ffion Waiting');
  const link = await (await page.request.post(`/api/plans/${waiting.planId}/quote-link`)).json();
  const cancel = await page.request.patch(`/api/jobs/${paid.job.id}`, { data: { status: 'cancelled' } });
  expect(cancel.status()).toBe(200);
  try {
    const customer = await browser.newContext();
    const quotePage = await customer.newPage();
    await quotePage.goto(link.url);
    const validity = quotePage.getByText(/valid until/).first();
    await expect(validity).toContainText(DATE_AS_WRITTEN);
    await expect(validity).not.toContainText(/\d{2}\/\d{2}\/\d{4}/);
    await customer.close();

    await signIn(page, DEMO.owner);
    await page.goto('/payments');
    const waitingQuote = (await (await page.request.get(`/api/plans/${waiting.planId}`)).json()).quote;
    const awaiting = page
      .locator('div')
      .filter({ has: page.getByRole('heading', { name: 'Quotes awaiting acceptance' }) })
      .last();
    await expect(awaiting).toContainText(waitingQuote.number);
    await expect(awaiting).toContainText(DATE_AS_WRITTEN);

    const refunds = page.getByTestId('refunds-due');
    await expect(refunds).toContainText(paid.job.reference);
    await refunds
      .getByLabel(`Reason for refunding ${paid.job.reference}`)
      .fill('Customer cancelled the shed');
    await page.screenshot({ path: 'test-results/payments-refunds.png', fullPage: true });
    await refunds.getByRole('button', { name: /^Refund £/ }).click();
    await expect(page.getByText(/Refund of £[\d.]+ sent to the card/)).toBeVisible();
    await page.reload();
    await expect(page.getByTestId('refunds-due')).not.toContainText(paid.job.reference);
    const ledger = page.getByTestId('payment-ledger');
    await expect(ledger).toContainText('Customer cancelled the shed');
    await expect(ledger).toContainText(/[−-]£\d+\.\d\d/); // the refund is a negative row
  } finally {
    // Reopen the job however the test ends, so the demo's cancelled jobs stay as other tests expect.
    await page.request.patch(`/api/jobs/${paid.job.id}`, { data: { status: 'draft' } });
  }
});

test('the owner edits how a section is sold, with its cost, and reads the margin at cost', async ({
  page,
}) => {
  await signIn(page, DEMO.owner);
  await page.goto('/stock');
  const row = page.getByTestId('section-row-T47100');
  await row.getByRole('button', { name: 'Edit 47×100 C24 treated' }).click();
  const editor = page.getByTestId('section-editor');
  await editor.getByLabel('Moisture').selectOption('green');
  await editor.getByLabel('Shortest kept offcut (mm)').fill('600');
  await editor.getByLabel('Finished width (mm)').fill('97');
  await editor.getByLabel('Cost of length 1 in pounds').fill('4.00');
  await page.screenshot({ path: 'test-results/section-editor.png', fullPage: true });
  await editor.getByRole('button', { name: 'Save section' }).click();
  await expect(editor).toHaveCount(0);
  await expect(row).toContainText('Green (wet)');
  await expect(row).toContainText('keeps offcuts from 600 mm');
  await expect(row).toContainText('finished 47 × 97');
  // 2.4 m at 265 p/m sells for £6.36; cost £4.00 is a margin of (636 − 400) / 636 = 37 %.
  await expect(row.locator('li', { hasText: /^2\.4 m ·/ })).toContainText('cost £4.00, 37 % margin');

  const plan = await plannedJob(page.request, 'Mared Margin');
  expect(plan.planId).toBeGreaterThan(0);
  await page.goto('/reports');
  const margin = page.getByTestId('report-margin');
  await expect(margin).toContainText(/Charged £[\d,.]+ before VAT; the timber cost £[\d,.]+/);
  await margin.getByText('Show the figures').click();
  await expect(margin.locator('tbody')).toContainText(plan.job.reference);
  await expect(page.getByTestId('report-savings')).toContainText(/rack offcuts worth|No jobs were planned/);
  await page.screenshot({ path: 'test-results/reports-margin.png', fullPage: true });
});
