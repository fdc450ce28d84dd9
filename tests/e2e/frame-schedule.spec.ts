import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO, signIn } from './support/sign-in';

/** The frame schedule editor as a yard hand uses it. */
class FrameEditor {
  constructor(readonly page: Page) {}
  panel(index: number): Locator {
    return this.page.getByTestId(`panel-card-${index}`);
  }
  async add(kind: string) {
    await this.page
      .getByTestId('add-panel')
      .getByRole('button', { name: `+ ${kind}`, exact: true })
      .click();
  }
  async fill(index: number, values: Record<string, string>) {
    for (const [label, value] of Object.entries(values)) {
      const field = this.panel(index).getByLabel(label, { exact: true });
      if ((await field.evaluate((el) => el.tagName)) === 'SELECT') await field.selectOption({ label: value });
      else await field.fill(value);
    }
  }
  async previewUpToDate() {
    await expect(this.page.getByTestId('preview-state')).toHaveText('Up to date');
  }
  row(label: string): Locator {
    return this.page.getByTestId('piece-schedule').getByRole('row').filter({ hasText: label });
  }
}

test('a yard hand describes a lean-to, previews it, sends it to a new job and plans it', async ({ page }) => {
  await signIn(page, DEMO.hand);
  await page.goto('/frames');
  const start = page.getByTestId('new-schedule-form');
  await start.getByLabel('Schedule name').fill('Lean-to for the Quarry Lane garden');
  await start.getByLabel('Customer').fill('Nell Ashdown');
  await start.getByRole('button', { name: 'Start schedule' }).click();
  await expect(page).toHaveURL(/\/frames\/\d+$/);
  await expect(page.getByTestId('structure-notice')).toContainText('does not size structure');

  const editor = new FrameEditor(page);
  await editor.add('Wall');
  await editor.fill(0, {
    'Panel name': 'back wall',
    Section: '47×100 C24 treated',
    Length: '2400',
    Height: '2200',
    'Stud centres': '400',
  });
  await editor.add('Wall');
  // Feet-inches are read too: 6'-2 13/16" is 1900 mm to the nearest millimetre.
  await editor.fill(1, {
    'Panel name': 'front wall',
    Length: '2.4 m',
    Height: `6'-2 13/16"`,
    'Stud centres': '400',
  });
  await editor.add('Sloped wall');
  await editor.fill(2, {
    'Panel name': 'side wall',
    Length: '1500',
    'Low side height': '1900',
    'High side height': '2200',
    'Stud centres': '400',
  });
  await editor.add('Door or window opening');
  await editor.fill(3, {
    'Panel name': 'side door',
    'In wall': 'side wall',
    'From wall start': '450',
    Width: '700',
    Height: '1650',
  });
  await editor.add('Roof');
  await editor.fill(4, {
    'Panel name': 'roof',
    'Rafter section': '47×150 C24 treated',
    'Span (front to back)': '1500',
    Rise: '300',
    'Length along the walls': '2400',
    'Rafter centres': '400',
  });

  await editor.previewUpToDate();
  await expect(editor.row('front wall stud')).toContainText('1806'); // 1900 less a sole plate and the UK's single head plate, 47 each
  // A UK yard (the default region) calls the piece over an opening a lintel.
  await expect(editor.row('side door lintel')).toBeVisible();
  await expect(editor.row('roof rafter')).toContainText('11.3°');
  await expect(editor.panel(0).getByRole('img', { name: 'back wall (elevation)' })).toBeVisible();
  await expect(editor.panel(2).getByRole('img', { name: 'side wall (elevation)' })).toBeVisible();

  // Bad geometry is named on its field, and the cut list cannot be sent until it is fixed.
  await editor.fill(2, { 'High side height': '1800' });
  await expect(page.getByTestId('preview-issues')).toContainText('lower than the low side');
  await expect(editor.panel(2).getByText('lower than the low side')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Send cut list to job' })).toBeDisabled();
  await editor.fill(2, { 'High side height': '2200' });
  await editor.previewUpToDate();

  await page.getByRole('button', { name: 'Save schedule' }).click();
  await expect(page.getByTestId('save-state')).toHaveText('All changes saved');

  const scheduleUrl = page.url();
  const send = page.getByTestId('send-to-job-form');
  // The schedule's customer has no record yet: the job is sent with a new one of that name.
  await expect(send.getByLabel('Customer', { exact: true })).toHaveValue('new');
  await expect(send.getByLabel('Customer name')).toHaveValue('Nell Ashdown');
  await send.getByRole('button', { name: 'Send cut list to job' }).click();
  await expect(page).toHaveURL(/\/jobs\/\d+$/);
  const jobId = Number(/\/jobs\/(\d+)$/.exec(page.url())![1]);

  await page.getByRole('button', { name: 'Plan this job' }).click();
  await expect(page).toHaveURL(/\/plans\/\d+$/, { timeout: 60_000 });
  await expect(page.getByTestId('board-diagram').first()).toBeVisible();
  const planId = Number(/\/plans\/(\d+)$/.exec(page.url())![1]);
  const plan = await (await page.request.get(`/api/plans/${planId}`)).json();
  expect(plan.jobId).toBe(jobId);
  expect(plan.boards.length).toBeGreaterThan(0);
  const cut = plan.boards.flatMap((b: { pieces: { label: string }[] }) => b.pieces.map((p) => p.label));
  expect(cut).toEqual(expect.arrayContaining(['roof rafter', 'side door lintel']));

  // The schedule remembers the job made from it.
  await page.goto('/frames');
  await expect(
    page.getByTestId('schedule-list').getByRole('row').filter({ hasText: 'Quarry Lane' }),
  ).toContainText('J-');

  // Sent to the same job again, the schedule asks: replace its pieces, or add a second set?
  await page.goto(scheduleUrl);
  const again = page.getByTestId('send-to-job-form');
  await again.getByLabel('A draft or planned job').check();
  await again.getByLabel('Job', { exact: true }).selectOption(String(jobId));
  await again.getByRole('button', { name: 'Send cut list to job' }).click();
  await expect(page.getByTestId('already-sent')).toContainText('already holds this schedule');
  await page.getByTestId('already-sent').scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'test-results/screens/frames-send-again-desktop.png' });
  await page.setViewportSize({ width: 768, height: 1024 });
  await page.screenshot({ path: 'test-results/screens/frames-send-again-tablet.png', fullPage: true });
  const before = (await (await page.request.get(`/api/jobs/${jobId}`)).json()).items.length;
  await page.getByRole('button', { name: 'Replace them' }).click();
  await expect(page).toHaveURL(new RegExp(`/jobs/${jobId}$`));
  const after = (await (await page.request.get(`/api/jobs/${jobId}`)).json()).items;
  expect(after.length).toBe(before);
  expect(after.every((i: { marks: string }) => /^\d+\.\d+/.test(i.marks))).toBe(true);
});

test('a saw operator cannot open frame schedules or use their API', async ({ page }) => {
  await signIn(page, DEMO.saw);
  await page.goto('/frames');
  await expect(page.getByTestId('access-denied')).toBeVisible();
  expect(
    (await page.request.post('/api/frames/preview', { data: { unit: 'mm', panels: [] } })).status(),
  ).toBe(403);
});

test('no two labels overlap on the demo lean-to drawings, at desktop and tablet size', async ({ page }) => {
  await signIn(page, DEMO.hand);
  const { schedules } = (await (await page.request.get('/api/frames')).json()) as {
    schedules: { id: number; name: string }[];
  };
  const demo = schedules.find((s) => s.name === 'Lean-to for Ines Marwood')!;
  for (const size of [
    { name: 'desktop', width: 1280, height: 900 },
    { name: 'tablet', width: 768, height: 1024 },
  ]) {
    await page.setViewportSize(size);
    await page.goto(`/frames/${demo.id}`);
    await expect(page.getByTestId('structure-notice')).toContainText('does not size structure');
    await expect(page.getByTestId('preview-state')).toHaveText('Up to date');
    const drawings = page.locator('[data-testid^="panel-card-"] svg[role="img"]');
    await expect(drawings).toHaveCount(8); // every panel of the lean-to but the opening, drawn on its wall
    // The drawings name pieces as the cut list does: the demo yard is in the UK (single head plate).
    const titles = (await page.locator('[data-testid^="panel-card-"] svg title').allTextContents()).join(
      '\n',
    );
    expect(titles).toContain('head plate');
    expect(titles).not.toContain('top plate');
    let labels = 0;
    for (const drawing of await drawings.all()) {
      // Each label's box as the browser drew it, in screen pixels.
      const boxes = await drawing.locator('text[data-label]').evaluateAll((texts) =>
        texts.map((t) => {
          const r = t.getBoundingClientRect();
          return { text: t.textContent, left: r.left, right: r.right, top: r.top, bottom: r.bottom };
        }),
      );
      labels += boxes.length;
      const clashes: string[] = [];
      boxes.forEach((a, i) =>
        boxes.slice(i + 1).forEach((b) => {
          const apart = a.right <= b.left || b.right <= a.left || a.bottom <= b.top || b.bottom <= a.top;
          if (!apart) clashes.push(`${a.text} × ${b.text}`);
        }),
      );
      expect(clashes, (await drawing.getAttribute('aria-label')) ?? '').toEqual([]);
    }
    expect(labels).toBeGreaterThan(100);
    await page.screenshot({ path: `test-results/screens/frame-labels-${size.name}.png`, fullPage: true });
  }
});
