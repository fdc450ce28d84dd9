import { expect, test, type Page } from '@playwright/test';
import { DEMO, signIn } from './support/sign-in';

// The rack: several offcuts moved to one place in one action, and the single-row move going the
// same way (one endpoint, one movement row per offcut). The office header stays one compact line on
// a tablet and opens its menu from a button.

const DESKTOP = { width: 1280, height: 900 };
const PORTRAIT = { width: 768, height: 1024 };
const shot = (name: string) => `test-results/screens/${name}.png`;

const rackRows = (page: Page) => page.locator('[data-testid^="offcut-row-"]');
const tagOf = async (page: Page, i: number) =>
  (await rackRows(page).nth(i).getAttribute('data-testid'))!.replace('offcut-row-', '');

test('the yard hand moves several offcuts to another rack location in one action', async ({ page }) => {
  await page.setViewportSize(DESKTOP);
  await signIn(page, DEMO.hand);
  const moves: string[] = [];
  page.on('request', (r) => {
    if (r.url().includes('/api/offcuts/') && r.method() !== 'GET')
      moves.push(`${r.method()} ${new URL(r.url()).pathname}`);
  });
  await page.goto('/rack');
  await expect(rackRows(page).nth(2)).toBeVisible();
  const tags = [await tagOf(page, 0), await tagOf(page, 1)];
  for (const tag of tags) await page.getByLabel(`Choose ${tag}`).check();
  const bar = page.getByTestId('chosen-offcuts-bar');
  await expect(bar).toContainText('2 chosen');
  await bar.getByLabel('Move the chosen offcuts to').fill('Bay 12 upper');
  await page.screenshot({ path: shot('rack-move-chosen-desktop'), fullPage: true });
  await bar.getByRole('button', { name: 'Move chosen' }).click();
  await expect(page.getByTestId('rack-message')).toHaveText('Moved 2 offcuts to Bay 12 upper.');
  await expect(bar).toBeHidden();
  for (const tag of tags) await expect(page.getByTestId(`offcut-row-${tag}`)).toContainText('Bay 12 upper');

  // One movement row per offcut, with who and where, in the stock movements (read as the API gives them).
  const { offcuts } = await (await page.request.get('/api/offcuts?location=Bay%2012%20upper')).json();
  expect(offcuts.map((o: { tag: string }) => o.tag).sort()).toEqual([...tags].sort());

  // The single-row move goes through the same endpoint.
  const third = await tagOf(page, 2);
  await page.getByRole('button', { name: `Move ${third}` }).click();
  await page.getByLabel(`New location of ${third}`).fill('Bay 12 upper');
  await page.getByRole('button', { name: 'Save' }).click();
  await expect(page.getByTestId(`offcut-row-${third}`)).toContainText('Bay 12 upper');
  expect(moves).toEqual(['POST /api/offcuts/move', 'POST /api/offcuts/move']);

  await page.setViewportSize(PORTRAIT);
  await page.getByLabel(`Choose ${third}`).check();
  await page.screenshot({ path: shot('rack-move-chosen-tablet'), fullPage: true });
});

test('the office header is one line on a tablet, with the menu behind a button', async ({ page }) => {
  await page.setViewportSize(PORTRAIT);
  await signIn(page, DEMO.owner);
  await page.goto('/jobs');
  const header = page.locator('header').first();
  const menu = page.getByRole('navigation', { name: 'Main' });
  await expect(menu).toBeHidden();
  // One row: the logo, the Menu button and who is signed in (48 px targets, little padding).
  expect((await header.boundingBox())!.height).toBeLessThanOrEqual(72);
  await page.screenshot({ path: shot('header-tablet-closed') });
  const button = page.getByRole('button', { name: 'Menu' });
  await expect(button).toHaveAttribute('aria-expanded', 'false');
  await button.click();
  await expect(button).toHaveAttribute('aria-expanded', 'true');
  await expect(menu.getByRole('link', { name: 'Offcut rack' })).toBeVisible();
  await expect(menu.getByRole('button', { name: 'Sign out' })).toBeVisible();
  await page.screenshot({ path: shot('header-tablet-open') });
  await page.keyboard.press('Escape');
  await expect(menu).toBeHidden();
  await button.click();
  await menu.getByRole('link', { name: 'Offcut rack' }).click();
  await expect(page).toHaveURL(/\/rack$/);
  await expect(menu).toBeHidden();

  // On a desktop the menu is always shown, in one row under the account line, and there is no Menu button.
  await page.setViewportSize(DESKTOP);
  await expect(menu.getByRole('link', { name: 'Yard settings' })).toBeVisible();
  await expect(button).toBeHidden();
  const links = menu.getByRole('link');
  const tops = new Set<number>();
  for (let i = 0; i < (await links.count()); i++) tops.add(Math.round((await links.nth(i).boundingBox())!.y));
  expect([...tops]).toHaveLength(1);
  await page.screenshot({ path: shot('header-desktop') });
});
