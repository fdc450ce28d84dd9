// Keyboard only: the skip link comes first, every control in the main content is reached by Tab,
// and wherever the focus lands its ring is drawn, unclipped, at 3:1 or more against what is behind
// it (WCAG 2.1.1 keyboard, 2.4.1 bypass blocks, 2.4.7 focus visible, 1.4.11 non-text contrast).
import { expect, test, type Page } from '@playwright/test';
import { settle } from './support/a11y';
import { findDemoIds, type DemoIds } from './support/demo-ids';
import { markMainControls, tab, type TabStop } from './support/keyboard';
import { DEMO, signIn } from './support/sign-in';

test.describe.configure({ timeout: 180_000 });

let ids: DemoIds;

test.beforeAll(async ({ browser }) => {
  const page = await browser.newPage();
  await signIn(page, DEMO.owner);
  ids = await findDemoIds(page);
  await page.close();
});

/** Tabs from the top of the page until the focus has gone round once; answers every stop. */
async function tabThrough(page: Page): Promise<TabStop[]> {
  const stops: TabStop[] = [];
  for (let i = 0; i < 300; i++) {
    const stop = await tab(page);
    if (!stop || (stops.length > 0 && stop.name === stops[0].name && stop.where === stops[0].where)) break;
    stops.push(stop);
  }
  return stops;
}

async function expectKeyboardReachable(page: Page, path: string) {
  await page.goto(path);
  await settle(page);
  const controls = await markMainControls(page);
  expect(Object.keys(controls).length).toBeGreaterThan(0);
  const stops = await tabThrough(page);
  expect(stops[0]?.name).toBe('a Skip to content');
  const reached = new Set(stops.map((s) => s.key));
  expect(Object.entries(controls).filter(([k]) => !reached.has(k))).toEqual([]);
  expect(stops.filter((s) => s.ringProblem).map((s) => `${s.where} "${s.name}": ${s.ringProblem}`)).toEqual(
    [],
  );
  expect(stops.some((s) => s.where === 'header')).toBe(true);
}

test('the job list is usable by keyboard alone', async ({ page }) => {
  await signIn(page, DEMO.owner);
  await expectKeyboardReachable(page, '/jobs');
});

test('a job page is usable by keyboard alone', async ({ page }) => {
  await signIn(page, DEMO.hand);
  await expectKeyboardReachable(page, `/jobs/${ids.jobId}`);
});

test('the saw screen is usable by keyboard alone on a tablet', async ({ page }) => {
  await page.setViewportSize({ width: 768, height: 1024 });
  await signIn(page, DEMO.saw);
  await expectKeyboardReachable(page, `/saw/${ids.sawPlanId}`);
});

test('the skip link takes the focus past the header to the content', async ({ page }) => {
  await signIn(page, DEMO.owner);
  await page.goto('/jobs');
  await settle(page);
  await page.keyboard.press('Tab');
  const skip = page.getByRole('link', { name: 'Skip to content' });
  await expect(skip).toBeFocused();
  await expect(skip).toBeInViewport();
  await page.keyboard.press('Enter');
  await expect(page.locator('main')).toBeFocused();
  // The next Tab lands in the content, not back in the header.
  const next = await tab(page);
  expect(next?.where).toBe('main');
});
