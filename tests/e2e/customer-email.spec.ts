import { expect, test } from '@playwright/test';
import { caughtMail } from './support/mail';
import { DEMO, signIn } from './support/sign-in';

// The e-mail the customer gets with a quote: from the yard (its name from the yard settings, the
// address from the server's mail settings), one greeting, the message box empty afterwards, and
// neither the e-mail nor the quote page showing the yard's rack tags or kept lengths.

type Offcut = { id: number; tag: string; sectionId: number; lengthMm: number };
type Board = { source: 'stock' | 'offcut'; offcutId: number | null; keepRemainder: boolean };

test('the quote e-mail comes from the yard with one greeting and no rack details', async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  await signIn(page, DEMO.hand);
  const request = page.request;
  const { settings } = await (await request.get('/api/settings')).json();

  // A job whose plan uses a rack offcut and keeps a remainder: the longest offcut on the rack takes
  // two short pieces; two long ones need new stock.
  const rack = await (
    await request.get('/api/offcuts?status=available&sort=length&dir=desc&pageSize=200')
  ).json();
  const longest: Offcut = rack.offcuts[0];
  const email = 'dana.fairweather@example.com';
  const customer = await (
    await request.post('/api/customers', { data: { name: 'Dana Fairweather', email, account: 'retail' } })
  ).json();
  const short = Math.floor(longest.lengthMm * 0.45);
  const tagById = new Map((rack.offcuts as Offcut[]).map((o) => [o.id, o.tag]));
  // Which long length leaves a remainder worth keeping depends on the section's stock lengths and its
  // shortest kept offcut, so try a few until the plan keeps one (the check below needs it).
  let found: { planId: number; usedTags: string[] } | undefined;
  for (const long of [2000, 1500, 2500, 1200, 3000, 900]) {
    const { job } = await (
      await request.post('/api/jobs', { data: { customerId: customer.id, customerEmail: email } })
    ).json();
    for (const [length, quantity, label] of [
      [short, 2, 'bed end'],
      [long, 2, 'bed side'],
    ] as const) {
      const added = await request.post(`/api/jobs/${job.id}/items`, {
        data: { sectionId: longest.sectionId, length: String(length), quantity, label },
      });
      expect(added.status()).toBeLessThan(300);
    }
    const planned = await request.post(`/api/jobs/${job.id}/plans`, { data: { useOffcuts: true } });
    expect(planned.status()).toBe(201);
    const planId: number = (await planned.json()).id;
    const plan = await (await request.get(`/api/plans/${planId}`)).json();
    const usedTags = (plan.boards as Board[])
      .filter((b) => b.source === 'offcut')
      .map((b) => tagById.get(b.offcutId!)!);
    if (usedTags.length > 0 && (plan.boards as Board[]).some((b) => b.keepRemainder)) {
      found = { planId, usedTags };
      break;
    }
  }
  expect(found, 'a plan that uses a rack offcut and keeps a remainder').toBeDefined();
  const { planId, usedTags } = found!;

  // First e-mail: the yard hand writes their own greeting.
  await page.goto(`/plans/${planId}`);
  const form = page.getByTestId('email-sheet-form');
  const message = form.getByLabel('Message (optional)');
  await message.fill('Hello Dana, here are the raised bed pieces we spoke about.');
  await form.getByRole('button', { name: 'E-mail quote and cut sheet' }).click();
  await expect(page.getByTestId('email-result')).toContainText(`sent to ${email}`);
  await expect(message).toHaveValue('');
  const first = (await caughtMail()).filter((m) => m.to.includes(email)).pop()!;
  expect(first.from).toContain(settings.yardName);
  // KERFWISE_MAIL_FROM's default address (README, Settings): the address, under the yard's name.
  expect(first.from).toContain('cutting@yard.test');
  expect(first.from).not.toContain('Kerfwise');
  const greetings = (text: string) => text.split('\n').filter((l) => /^(hello|hi|dear)\b/i.test(l.trim()));
  expect(greetings(first.text)).toEqual(['Hello Dana, here are the raised bed pieces we spoke about.']);

  // Second e-mail, no greeting of their own: the product greets the customer by name, once.
  await message.fill('Ready to collect on Friday.');
  await form.getByRole('button', { name: 'E-mail quote and cut sheet' }).click();
  await expect(message).toHaveValue('');
  await expect.poll(async () => (await caughtMail()).filter((m) => m.to.includes(email)).length).toBe(2);
  const second = (await caughtMail()).filter((m) => m.to.includes(email)).pop()!;
  expect(greetings(second.text)).toEqual(['Hello Dana Fairweather,']);
  expect(second.text).toContain('Ready to collect on Friday.');

  // Neither the e-mail nor the customer's quote page shows rack tags or what the yard keeps.
  const quoteUrl = second.text.match(/https?:\/\/\S+\/q\/[\w-]+/)![0];
  const customer_ = await browser.newContext();
  const quotePage = await customer_.newPage();
  await quotePage.goto(quoteUrl);
  await expect(quotePage.getByTestId('quote-table')).toBeVisible();
  const seen = {
    'first e-mail': first.text,
    'second e-mail': second.text,
    'quote page': await quotePage.locator('body').innerText(),
  };
  for (const [where, text] of Object.entries(seen)) {
    for (const tag of usedTags) expect(text, `${where} shows ${tag}`).not.toContain(tag);
    expect(text, where).not.toMatch(/\bkeep\b|for the rack|kept remainder/i);
  }
  await quotePage.screenshot({ path: 'test-results/screens/customer-quote-no-rack.png', fullPage: true });
  await customer_.close();
});
