import { expect, test } from '@playwright/test';
import { DEMO, signIn, signInWithForm } from './support/sign-in';

test.describe('signing in', () => {
  const homes = [
    { email: DEMO.owner, path: /\/overview$/, heading: 'Yard overview' },
    { email: DEMO.hand, path: /\/jobs$/, heading: 'Jobs' },
    { email: DEMO.saw, path: /\/saw$/, heading: 'Saw queue' },
  ];

  for (const home of homes) {
    test(`${home.email} lands on their own home`, async ({ page }) => {
      // The one real sign-in through the form, for each role.
      await signInWithForm(page, home.email);
      await expect(page).toHaveURL(home.path);
      await expect(page.getByRole('heading', { level: 1, name: home.heading })).toBeVisible();
    });
  }

  test('a wrong password shows a clear message and stays on the sign-in page', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(DEMO.hand);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByTestId('sign-in-error')).toContainText('do not match');
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test('a signed-out visitor is sent to the sign-in page', async ({ page }) => {
    await page.goto('/users');
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test('signing out returns to the sign-in page', async ({ page }) => {
    await signInWithForm(page, DEMO.owner);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page).toHaveURL(/\/sign-in/);
  });
});

test.describe('user management', () => {
  test('a saw operator is refused the user management page and API', async ({ page }) => {
    await signIn(page, DEMO.saw);
    await page.goto('/users');
    await expect(page.getByTestId('access-denied')).toBeVisible();
    const response = await page.request.get('/api/users');
    expect(response.status()).toBe(403);
  });

  test('the owner adds a yard hand and cannot demote the last owner', async ({ page }) => {
    await signIn(page, DEMO.owner);
    await page.goto('/users');
    const form = page.getByTestId('add-user-form');
    await form.getByLabel('Name').fill('Sam Kettering');
    await form.getByLabel('E-mail').fill('sam@yard.test');
    await form.getByLabel('First password').fill('offcut-rack-9');
    await form.getByRole('button', { name: 'Add account' }).click();
    await expect(page.getByTestId('user-row-sam@yard.test')).toBeVisible();

    // A role change and a disabling are asked about first, and say when they are saved.
    const sam = page.getByTestId('user-row-sam@yard.test');
    await sam.getByLabel('Role of Sam Kettering').selectOption('saw_operator');
    await sam.getByRole('button', { name: 'Keep as it is' }).click();
    await expect(sam.getByLabel('Role of Sam Kettering')).toHaveValue('yard_hand');
    await expect(sam.getByTestId('user-saved')).toBeEmpty();
    await sam.getByLabel('Role of Sam Kettering').selectOption('saw_operator');
    await expect(sam.getByTestId('user-confirm')).toContainText(
      "Change Sam Kettering's role to saw operator?",
    );
    await sam.getByRole('button', { name: 'Change the role' }).click();
    await expect(sam.getByTestId('user-saved')).toHaveText('Saved: Sam Kettering is now saw operator.');
    await expect(sam.getByLabel('Role of Sam Kettering')).toHaveValue('saw_operator');
    await sam.getByRole('button', { name: 'Disable' }).click();
    await sam.getByRole('button', { name: 'Disable the account' }).click();
    await expect(sam.getByTestId('user-saved')).toHaveText("Saved: Sam Kettering's account is disabled.");
    await expect(sam.getByRole('button', { name: 'Enable' })).toBeVisible();

    await page.getByLabel('Role of Maggie Rowntree').selectOption('yard_hand');
    await page
      .locator('tr', { has: page.getByLabel('Role of Maggie Rowntree') })
      .getByRole('button', { name: 'Change the role' })
      .click();
    await expect(page.getByRole('alert').filter({ hasText: 'at least one active owner' })).toBeVisible();
    await expect(page.getByLabel('Role of Maggie Rowntree')).toHaveValue('owner');
  });
});
