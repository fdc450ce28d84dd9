import { expect, test } from '@playwright/test';
import { acceptAndPayDeposit } from './support/payments';
import { DEMO, signIn } from './support/sign-in';

// Full lengths and nominal pieces (DESIGN.md, "Full lengths and nominal pieces"): a piece as long as
// a stock length is sold whole, and nominal pieces may be cut a few mm short so two fit a board twice
// their length. Selling that way is common practice, no published source. The customer is invented.
test.describe('nominal pieces and full lengths', () => {
  test.setTimeout(180_000);

  test('a yard hand marks a line nominal, plans, and the plan, cut sheet and saw show the cuts', async ({
    page,
    browser,
  }) => {
    await signIn(page, DEMO.hand);
    const created = await page.request.post('/api/jobs', { data: { customerName: 'Hollin Lane Sheds' } });
    expect(created.status()).toBe(201);
    const { job } = await created.json();
    const { sections } = await (await page.request.get('/api/sections')).json();
    const cls = sections.find((s: { code: string }) => s.code === 'CLS3889');
    for (const [length, quantity, label] of [
      [3600, 1, 'corner post'],
      [2400, 2, 'stud'],
    ] as const) {
      const res = await page.request.post(`/api/jobs/${job.id}/items`, {
        data: { sectionId: cls.id, length, quantity, label },
      });
      expect(res.status()).toBe(201);
    }

    // The yard hand sets the studs nominal on the job page: the yard's 5 mm comes up, editable.
    await page.goto(`/jobs/${job.id}`);
    // The add-a-row form appears once the table is live in the browser; edits before that are lost.
    await expect(page.getByRole('button', { name: 'Add row' })).toBeVisible();
    const fit = page.getByLabel('Exact or nominal, row 2');
    await expect(async () => {
      if (!(await fit.isVisible())) await page.getByRole('button', { name: 'Edit row 2' }).click();
      await expect(fit).toBeVisible({ timeout: 2_000 });
    }).toPass();
    await fit.selectOption('nominal');
    await expect(page.getByLabel('Millimetres short allowed, row 2')).toHaveValue('5');
    await page.getByRole('button', { name: 'Save' }).click();
    const rows = page.getByTestId('item-row');
    await expect(rows.nth(1).getByTestId('item-fit')).toHaveText('nominal, up to 5 mm short');
    await expect(rows.nth(0).getByTestId('item-fit')).toHaveText('exact');
    await page.screenshot({ path: 'test-results/screens/nominal-items-table.png', fullPage: true });

    // Planned from the 3.6 m and 4.8 m lengths only, without the rack, so the plan is known:
    // the post takes a whole 3.6 m board; the two studs share one 4.8 m board, 2398 and 2399 mm.
    const allowed = cls.lengths
      .filter((l: { lengthMm: number }) => l.lengthMm === 3600 || l.lengthMm === 4800)
      .map((l: { id: number }) => l.id);
    const planned = await page.request.post(`/api/jobs/${job.id}/plans`, {
      data: { useOffcuts: false, stockLengthIds: allowed },
    });
    expect(planned.status()).toBe(201);
    const plan = await planned.json();

    await page.goto(`/plans/${plan.id}`);
    await expect(page.getByTestId('full-length').first()).toHaveText('full length, no cut');
    await expect(page.getByTestId('actual-cuts').first()).toContainText('stud 2398 mm (listed 2400 mm)');
    await expect(page.getByTestId('actual-cuts').first()).toContainText('stud 2399 mm (listed 2400 mm)');
    await page.screenshot({ path: 'test-results/screens/nominal-plan-page.png', fullPage: true });

    await page.goto(`/plans/${plan.id}/sheet`);
    const sheet = page.getByTestId('cut-sheet');
    await expect(sheet.getByTestId('full-length').first()).toHaveText('full length, no cut');
    await expect(sheet.getByTestId('sheet-nominal')).toContainText('nominal, cut to 2398 mm–2399 mm');
    await page.screenshot({ path: 'test-results/screens/nominal-cut-sheet.png', fullPage: true });
    const pdf = await page.request.get(`/api/plans/${plan.id}/cut-sheet`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');

    // The customer's quote page says which pieces are nominal and which are cut exact.
    const link = await (await page.request.post(`/api/plans/${plan.id}/quote-link`)).json();
    const customer = await browser.newContext();
    const quotePage = await customer.newPage();
    await quotePage.goto(link.url);
    const kinds = quotePage.getByTestId('customer-pieces').getByTestId('piece-length-kind');
    await expect(kinds).toHaveCount(2);
    await expect(kinds.nth(0)).toHaveText('exact length');
    await expect(kinds.nth(1)).toHaveText('nominal: may be up to 5 mm short');
    await quotePage.screenshot({ path: 'test-results/screens/nominal-customer-quote.png', fullPage: true });
    await customer.close();

    await acceptAndPayDeposit(page.request, plan.id);
    expect((await page.request.post(`/api/plans/${plan.id}/release`)).status()).toBe(200);

    // At the saw (tablet, landscape): the full-length board is handed over, the studs are cut short.
    const tablet = await browser.newContext({ viewport: { width: 1024, height: 768 }, hasTouch: true });
    const saw = await tablet.newPage();
    await signIn(saw, DEMO.saw);
    await saw.getByTestId(`queue-${job.reference}`).tap();
    const board = saw.getByTestId('current-board');
    // Boards come longest first: the 4.8 m board with the two studs.
    await expect(board.getByTestId('cut-1').getByTestId('piece-length')).toHaveText(/2398|2399/);
    await expect(board.getByTestId('piece-listed').first()).toContainText('nominal 2400 mm: cut to');
    await saw.screenshot({ path: 'test-results/screens/nominal-saw-cut-short.png', fullPage: true });
    await saw.getByTestId('board-done').tap();
    await expect(saw.getByTestId('station-message')).toContainText('Board 1 done');
    await expect(board.getByTestId('full-length-step')).toContainText('Full length, no cut');
    await expect(board.getByTestId('fetch-line')).toContainText('full length, no cut');
    await expect(saw.getByRole('button', { name: 'No cut needed' })).toBeDisabled();
    await saw.screenshot({ path: 'test-results/screens/nominal-saw-full-length.png', fullPage: true });
    await tablet.close();
  });
});
