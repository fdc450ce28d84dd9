// Security headers on every answer, pages still working under the content security policy,
// refused pages answering HTTP 403, and sign-out ending the session for good.
import { expect, test } from '@playwright/test';
import { DEMO, signIn, signInWithForm } from './support/sign-in';

test('pages carry the security headers and run under the policy', async ({ page }) => {
  const blocked: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy|Refused to/i.test(m.text())) blocked.push(m.text());
  });
  const res = await page.goto('/sign-in');
  const headers = res!.headers();
  expect(headers['content-security-policy']).toContain("frame-ancestors 'none'");
  expect(headers['x-content-type-options']).toBe('nosniff');
  expect(headers['referrer-policy']).toBe('same-origin');
  // Through the form, so its script and its request run under the policy too.
  await signInWithForm(page, DEMO.owner);
  await page.goto('/jobs');
  await expect(page.getByRole('heading', { name: 'Jobs' })).toBeVisible();
  expect(blocked).toEqual([]);
});

test('a page the role may not open answers 403', async ({ page }) => {
  await signIn(page, DEMO.saw);
  for (const url of ['/jobs', '/jobs/1', '/plans/1', '/reports']) {
    const res = await page.goto(url);
    expect(res!.status(), url).toBe(403);
  }
  await expect(page.getByTestId('access-denied')).toBeVisible();
  await page.screenshot({ path: 'test-results/forbidden-page.png' });
});

test('an old session cookie stops working after sign-out', async ({ page, context }) => {
  await signIn(page, DEMO.hand);
  const cookies = await context.cookies();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/sign-in/);
  await context.addCookies(cookies);
  const res = await page.request.get('/api/jobs');
  expect(res.status()).toBe(401);
});

test('a cross-site form post is refused', async ({ page }) => {
  await signIn(page, DEMO.owner);
  const res = await page.request.post('/api/users', {
    headers: { 'content-type': 'text/plain', origin: 'http://evil.test' },
    data: JSON.stringify({ email: 'x@evil.test', name: 'X', role: 'owner', password: 'long-enough' }),
  });
  expect(res.status()).toBe(403);
});
