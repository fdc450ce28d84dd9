import { expect, test, type Browser } from '@playwright/test';
import { acceptAndPayDeposit } from './support/payments';
import { DEMO, signIn } from './support/sign-in';
import { SawStationPage } from './support/saw-station';

const tablet = (width: number, height: number) => ({
  viewport: { width, height },
  hasTouch: true,
  isMobile: false,
});

async function officePage(browser: Browser) {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  await signIn(page, DEMO.hand);
  return page;
}

test.describe('the saw station in landscape (1024×768, touch)', () => {
  test.use(tablet(1024, 768));

  test('the operator cuts a whole released plan while the office watches the progress', async ({
    page,
    browser,
  }) => {
    // A whole plan cut board by board, with the office watching: the longest flow here.
    test.setTimeout(120_000);
    await signIn(page, DEMO.saw);
    await expect(page).toHaveURL(/\/saw$/);
    await page.getByTestId('queue-J-1002').tap();
    const saw = new SawStationPage(page);
    await expect(saw.progress()).toContainText('0 of');
    const { total } = await saw.boardsCut();
    expect(total).toBeGreaterThan(3);

    // The cautions are one line that opens on a tap.
    // Cross-cut saw cautions (HSE WIS36; HSE cross-cut saw guidance), deferring to the yard's risk assessment.
    await expect(page.getByTestId('safety-line')).toContainText('Blade at rest before hands go near');
    await page.getByTestId('safety-line').locator('summary').tap();
    await expect(page.getByTestId('safety-line')).toContainText('own risk assessment');
    await expect(page.getByTestId('safety-line')).toContainText('HSE WIS36');
    await expect(page.getByTestId('cut-1').getByTestId('piece-length')).toBeVisible();
    await page.screenshot({ path: 'test-results/screens/saw-cautions-tablet-landscape.png', fullPage: true });
    await page.getByTestId('safety-line').locator('summary').tap();

    // The next cut is highlighted, and each "cut made" moves the highlight on.
    await expect(page.getByTestId('cut-1')).toHaveAttribute('data-state', 'next');
    await page.getByRole('button', { name: 'Cut 1 made' }).tap();
    await expect(page.getByTestId('cut-1')).toHaveAttribute('data-state', 'done');
    await expect(page.getByTestId('board-drawing')).toBeVisible();

    await saw.confirmCurrentBoard();
    await saw.confirmCurrentBoard();
    await expect(saw.progress()).toContainText(`2 of ${total}`);

    // Undo takes back exactly the last board.
    const undo = page.getByRole('button', { name: /Undo board 2/ });
    await undo.tap();
    await expect(page.getByTestId('station-message')).toContainText('Board 2 is back to be cut');
    await expect(saw.progress()).toContainText(`1 of ${total}`);
    await saw.confirmCurrentBoard();

    // The office sees the saw's progress, and it updates without a reload.
    const office = await officePage(browser);
    await office.goto('/jobs');
    await expect(office.getByTestId('saw-progress-J-1002')).toContainText(`2 of ${total} boards cut`);
    await saw.confirmCurrentBoard();
    await expect(office.getByTestId('saw-progress-J-1002')).toContainText(`3 of ${total} boards cut`);

    await saw.cutEverything();
    await expect(saw.progress()).toContainText(`${total} of ${total}`);
    await office.reload();
    // Done jobs leave the open list; the office finds them under Show.
    await office.getByTestId('job-show').selectOption('closed');
    await expect(office.getByTestId('jobs-table').getByRole('row', { name: /J-1002/ })).toContainText('done');
    await office.context().close();

    await page.getByRole('link', { name: 'Back to the queue' }).tap();
    await expect(page.getByTestId('queue-J-1002')).toHaveCount(0);
  });
});

test.describe('the saw station in portrait (768×1024, touch)', () => {
  test.use(tablet(768, 1024));

  test('a bad board is re-planned at once, labels print, and new offcuts are on the rack', async ({
    page,
    browser,
  }) => {
    // A long walk (re-plan, every board, labels, rack): more than the default minute on a busy machine.
    test.setTimeout(180_000);
    // The yard hand releases J-1003, which uses rack offcuts.
    const office = await officePage(browser);
    const { jobs } = await (await office.request.get('/api/jobs?q=J-1003')).json();
    const job = jobs.find((j: { reference: string }) => j.reference === 'J-1003');
    // Plan it afresh: earlier tests may have scrapped or used rack offcuts the seeded plan relied on.
    const replanned = await office.request.post(`/api/jobs/${job.id}/plans`, { data: {} });
    expect(replanned.status()).toBe(201);
    const planned = await replanned.json();
    await acceptAndPayDeposit(office.request, planned.id);
    expect((await office.request.post(`/api/plans/${planned.id}/release`)).status()).toBe(200);

    await signIn(page, DEMO.saw);
    await page.getByTestId('queue-J-1003').tap();
    const saw = new SawStationPage(page);
    await expect(saw.progress()).toContainText('0 of');
    const before = await saw.boardsCut();

    // Board 1 turns out split; the sound part is kept and the pieces are re-planned.
    await page.getByRole('button', { name: 'Board is bad…' }).tap();
    await page.getByRole('radio', { name: 'split' }).tap();
    // Every board of J-1003 holds a piece of at least 450 mm, so 400 mm is always shorter than board 1
    // and still long enough (≥ 300 mm) to go back on the rack.
    await page.getByLabel('Sound length still usable (optional)').fill('400');
    await page.getByRole('button', { name: 'Report and re-plan' }).tap();
    await expect(page.getByTestId('station-message')).toContainText('Board 1 recorded as bad');
    await expect(page.getByTestId('station-message')).toContainText('re-planned on board');
    await expect(page.getByTestId('board-1')).toHaveAttribute('data-status', 'defective');
    const after = await saw.boardsCut();
    expect(after.total).toBeGreaterThan(before.total);
    // A bad board is not counted as cut.
    expect(after.done).toBe(0);
    await expect(saw.progress()).toContainText('1 bad, not cut');
    await expect(page.getByTestId('board-1')).toContainText('bad, not cut');

    // Follow the new sequence to the end, noting the kept offcuts.
    const tags = await saw.cutEverything();
    expect(tags.length).toBeGreaterThan(0);

    // Print the label of the first kept offcut, racked somewhere of the operator's choosing.
    await page.goto('/saw/find');
    await page.getByPlaceholder('Tag, e.g. K-0001').fill(tags[0].toLowerCase());
    await page.getByRole('button', { name: 'Find' }).tap();
    await expect(page.getByTestId('offcut-card')).toContainText('Rack intake');
    await page.getByRole('link', { name: 'Print its label' }).tap();
    const label = page.getByTestId(`label-${tags[0]}`);
    await expect(label).toContainText(tags[0]);
    await expect(label.locator('svg')).toBeVisible();
    await label.getByLabel('Rack location').fill('Rack C2');
    await label.getByRole('button', { name: 'Set place' }).tap();
    await expect(label).toContainText('Rack C2');
    await page.getByRole('link', { name: /A4 sheet/ }).tap();
    await expect(page.getByTestId('label-sheet')).toHaveClass(/labels-a4/);

    // Every new offcut is on the rack, available, where the finder can see it.
    for (const tag of tags) {
      const found = await page.request.get(`/api/saw/offcuts?tag=${tag}`);
      expect(found.status()).toBe(200);
      expect((await found.json()).offcut).toMatchObject({ tag, status: 'available' });
    }
    await page.goto('/saw/find');
    await page.getByPlaceholder('Tag, e.g. K-0001').fill(tags[0]);
    await page.getByRole('button', { name: 'Find' }).tap();
    await expect(page.getByTestId('offcut-card')).toContainText('Rack C2');

    // The office sees the job done.
    await office.goto('/jobs');
    await office.getByTestId('job-show').selectOption('closed');
    await expect(office.getByTestId('jobs-table').getByRole('row', { name: /J-1003/ })).toContainText('done');
    await office.context().close();
  });
});
