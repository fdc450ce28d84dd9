import { expect, test, type APIRequestContext, type Browser, type Page } from '@playwright/test';
import { caughtMail } from './support/mail';
import { CARDS } from './support/payments';
import { DEMO, signIn } from './support/sign-in';

// Quote to cash: the yard hand e-mails a quote; the customer, in a browser of their own, opens the
// link from the caught e-mail, accepts, pays on the payment fake's card page and comes back.

async function plannedRetailJob(request: APIRequestContext, name: string, email: string) {
  const customer = await (
    await request.post('/api/customers', { data: { name, email, account: 'retail' } })
  ).json();
  const { job } = await (
    await request.post('/api/jobs', { data: { customerId: customer.id, customerEmail: email } })
  ).json();
  const { sections } = await (await request.get('/api/sections')).json();
  const section = sections.find((s: { code: string }) => s.code === 'T47100');
  await request.post(`/api/jobs/${job.id}/items`, {
    data: { sectionId: section.id, length: '1800', quantity: 4, label: 'post' },
  });
  const plan = await request.post(`/api/jobs/${job.id}/plans`, { data: { useOffcuts: false } });
  expect(plan.status()).toBe(201);
  return { job, planId: (await plan.json()).id as number };
}

async function emailQuote(page: Page, planId: number, email: string) {
  await page.goto(`/plans/${planId}`);
  const form = page.getByTestId('email-sheet-form');
  await form.getByLabel('Message (optional)').fill('Hi there, here is the price we talked about.');
  await form.getByRole('button', { name: 'E-mail quote and cut sheet' }).click();
  await expect(page.getByTestId('email-result')).toContainText(`sent to ${email}`);
  await expect(form.getByLabel('Message (optional)')).toHaveValue('');
  const mail = (await caughtMail()).filter((m) => m.to.includes(email)).pop()!;
  expect(mail.from).toContain('Brackenridge Timber & Saw');
  expect(mail.text).not.toMatch(/^Hello/);
  expect(mail.text).toContain('Hi there, here is the price');
  return mail.text.match(/https?:\/\/\S+\/q\/[\w-]+/)![0];
}

async function customerOpens(browser: Browser, url: string) {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(url);
  await expect(page.getByRole('heading', { name: /Quote J-\d+\/Q1/ })).toBeVisible();
  await page.getByLabel('Your name').fill('Jo Customer');
  await page.getByLabel('I understand that timber cut to my lengths cannot be returned.').check();
  await page.getByRole('button', { name: 'Accept quote' }).click();
  await page.getByRole('button', { name: /Pay deposit/ }).click();
  await expect(page.getByTestId('fake-amount')).toBeVisible();
  return { context, page };
}

async function payOnCardPage(page: Page, card: string) {
  await page.getByLabel('Card number').fill(card);
  await page.getByLabel('Expiry (MM/YY)').fill('12/30');
  await page.getByLabel('Security code').fill('123');
  await page.getByRole('button', { name: /^Pay £/ }).click();
}

test('the customer accepts and pays the deposit; the job shows paid and goes to the saw', async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  await signIn(page, DEMO.hand);
  const { planId } = await plannedRetailJob(page.request, 'Jo Approved', 'jo.approved@example.com');
  const url = await emailQuote(page, planId, 'jo.approved@example.com');

  const customer = await customerOpens(browser, url);
  await payOnCardPage(customer.page, CARDS.approved);
  await expect(customer.page).toHaveURL(/\/q\/[\w-]+\?payment=done/);
  await expect(customer.page.getByTestId('payment-returned')).toContainText('We have received');
  await expect(customer.page.getByTestId('customer-payment-state')).toContainText('Deposit paid');
  await customer.context.close();

  await page.reload();
  await expect(page.getByTestId('quote-state')).toContainText('Deposit paid');
  await page.getByRole('button', { name: 'Release to the saw' }).click();
  await expect(page.getByText('Released to the saw')).toBeVisible();
});

test('a declined card leaves the job unpaid and release refused', async ({ page, browser }) => {
  test.setTimeout(120_000);
  await signIn(page, DEMO.hand);
  const { planId } = await plannedRetailJob(page.request, 'Jo Declined', 'jo.declined@example.com');
  const url = await emailQuote(page, planId, 'jo.declined@example.com');

  const customer = await customerOpens(browser, url);
  await payOnCardPage(customer.page, CARDS.declined);
  await expect(customer.page.getByTestId('fake-card-error')).toContainText('declined');
  await customer.page.goto(url);
  await expect(customer.page.getByTestId('customer-payment-state')).toContainText('Accepted, not paid');
  await expect(customer.page.getByTestId('payment-error')).toContainText('declined');
  await customer.context.close();

  await page.reload();
  await expect(page.getByTestId('quote-state')).toContainText('Accepted, not paid');
  await page.getByRole('button', { name: 'Release to the saw' }).click();
  await expect(page.getByTestId('release-error')).toContainText('has not paid the deposit');
});

test('the customer quote page at phone and desktop size', async ({ page, browser }) => {
  await signIn(page, DEMO.hand);
  const { planId } = await plannedRetailJob(page.request, 'Jo Screens', 'jo.screens@example.com');
  const link = await (await page.request.post(`/api/plans/${planId}/quote-link`)).json();
  const tampered = link.url.slice(0, -1) + (link.url.endsWith('A') ? 'B' : 'A');
  expect((await page.request.get(tampered)).status()).toBe(404);
  for (const [name, viewport] of [
    ['phone', { width: 390, height: 844 }],
    ['desktop', { width: 1280, height: 900 }],
  ] as const) {
    const context = await browser.newContext({ viewport });
    const customer = await context.newPage();
    const response = await customer.goto(link.url);
    expect(response?.status()).toBe(200);
    await expect(customer.getByTestId('quote-table')).toBeVisible();
    await customer.screenshot({ path: `test-results/customer-quote-${name}.png`, fullPage: true });
    await context.close();
  }
});
