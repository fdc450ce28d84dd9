import { expect, type Page } from '@playwright/test';

export const DEMO = {
  owner: 'owner@yard.test',
  hand: 'hand@yard.test',
  saw: 'saw@yard.test',
} as const;

/** Signs in through the sign-in page as a real person would. */
export async function signIn(page: Page, email: string, password = 'kerfwise') {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('signed-in-as')).toBeVisible();
}
