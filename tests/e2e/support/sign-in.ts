import { expect, type Page } from '@playwright/test';

export const DEMO = {
  owner: 'owner@yard.test',
  hand: 'hand@yard.test',
  saw: 'saw@yard.test',
} as const;

/**
 * Signs in with the same request the sign-in form sends (the sign-in endpoint, with its CSRF token),
 * then opens the home page, where the signed-in person lands. Much quicker than filling the form;
 * the sign-in tests use the form itself (signInWithForm).
 */
export async function signIn(page: Page, email: string, password = 'kerfwise') {
  const csrf = await page.request.get('/api/auth/csrf');
  expect(csrf.ok()).toBe(true);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await page.request.post('/api/auth/callback/credentials', {
    form: { csrfToken, email, password, json: 'true' },
  });
  const { url } = (await res.json()) as { url?: string };
  expect(res.ok() && !url?.includes('error='), `sign-in as ${email}: ${res.status()} ${url}`).toBe(true);
  await page.goto('/');
  await expect(page.getByTestId('signed-in-as')).toBeVisible();
}

/** Signs in through the sign-in page as a real person would. */
export async function signInWithForm(page: Page, email: string, password = 'kerfwise') {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('signed-in-as')).toBeVisible();
}
