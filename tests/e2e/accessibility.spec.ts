// Every page of every role through axe-core (WCAG 2.0/2.1 A and AA), disclosure panels open,
// the saw's pages at tablet size and held to 7:1 text contrast and 3:1 control edges.
// A page added later is checked once it is added to PAGES below.
import { expect, test } from '@playwright/test';
import { axeViolations, openDisclosures, settle, weakControlEdges } from './support/a11y';
import { findDemoIds, type DemoIds as Ids } from './support/demo-ids';
import { DEMO, signIn } from './support/sign-in';

type Role = keyof typeof DEMO;
type PageCheck = {
  /** The address; {jobId} and the like are filled in from the demo yard. */
  path: string;
  roles: Role[];
  /** Saw screens: run at tablet size with the workshop contrast rules. */
  saw?: boolean;
};

// axe over a chart-heavy page is slow on a shared machine.
test.describe.configure({ timeout: 180_000 });

const OFFICE: Role[] = ['owner', 'hand'];
const PAGES: PageCheck[] = [
  { path: '/overview', roles: ['owner'] },
  { path: '/jobs', roles: OFFICE },
  { path: '/jobs/{jobId}', roles: OFFICE },
  { path: '/plans/{planId}', roles: OFFICE },
  { path: '/plans/{planId}/sheet', roles: OFFICE },
  { path: '/plans/compare?a={planId}&b={otherPlanId}', roles: OFFICE },
  { path: '/frames', roles: OFFICE },
  { path: '/frames/{scheduleId}', roles: OFFICE },
  { path: '/rack', roles: OFFICE },
  { path: '/stock', roles: OFFICE },
  { path: '/outbox', roles: OFFICE },
  { path: '/reports', roles: ['owner'] },
  { path: '/users', roles: ['owner'] },
  { path: '/settings', roles: ['owner'] },
  { path: '/saw', roles: ['owner', 'saw'], saw: true },
  { path: '/saw/find', roles: ['owner', 'saw'], saw: true },
  { path: '/saw/{sawPlanId}', roles: ['owner', 'saw'], saw: true },
  { path: '/labels/offcuts?plan={sawPlanId}', roles: ['owner', 'hand', 'saw'] },
];

const DESKTOP = { width: 1280, height: 900 };
const TABLET = { width: 768, height: 1024 };

let ids: Ids;
const signedIn: Partial<Record<Role, string>> = {};

// Each role signs in once; every page is then its own test.
test.beforeAll(async ({ browser }, info) => {
  for (const role of Object.keys(DEMO) as Role[]) {
    const page = await browser.newPage();
    await signIn(page, DEMO[role]);
    if (role === 'owner') ids = await findDemoIds(page);
    signedIn[role] = info.outputPath(`${role}.json`);
    await page.context().storageState({ path: signedIn[role] });
    await page.close();
  }
});

test('the sign-in page has no accessibility violations', async ({ page }) => {
  await page.goto('/sign-in');
  expect(await axeViolations(page)).toEqual([]);
});

for (const role of Object.keys(DEMO) as Role[]) {
  for (const check of PAGES.filter((p) => p.roles.includes(role))) {
    test(`${role}: ${check.path} has no accessibility violations`, async ({ browser }) => {
      const context = await browser.newContext({
        storageState: signedIn[role],
        viewport: check.saw ? TABLET : DESKTOP,
        hasTouch: check.saw,
      });
      const page = await context.newPage();
      await page.goto(check.path.replace(/\{(\w+)\}/g, (_, key: keyof Ids) => String(ids[key])));
      await settle(page);
      await openDisclosures(page);
      const found = await axeViolations(page, { enhancedContrast: check.saw });
      if (check.saw) found.push(...(await weakControlEdges(page)).map((w) => `control edge under 3:1: ${w}`));
      await context.close();
      expect(found).toEqual([]);
    });
  }
}
