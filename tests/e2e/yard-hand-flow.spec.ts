import { expect, test } from '@playwright/test';
import { caughtMail } from './support/mail';
import { acceptAndPayDeposit } from './support/payments';
import { DEMO, signIn } from './support/sign-in';

const csvFile = (name: string, rows: string[]) => ({
  name,
  mimeType: 'text/csv',
  buffer: Buffer.from(rows.join('\n')),
});

test.describe('the yard hand flow', () => {
  test.setTimeout(180_000);

  test('create a job, fix a bad cut list, plan, e-mail the sheet, release and take back', async ({
    page,
  }) => {
    await signIn(page, DEMO.hand);
    await page.getByRole('button', { name: 'New job' }).click();
    const form = page.getByTestId('new-job-form');
    // No record yet: the picker opens a new customer with the name searched for.
    await form.getByLabel('Find a customer').fill('Wren Castellane');
    await expect(form.getByLabel('Customer name')).toHaveValue('Wren Castellane');
    await form.getByLabel('Customer e-mail').fill('wren@example.com');
    await form.getByLabel('Due date').fill('2026-12-18');
    await form.getByRole('button', { name: 'Create job' }).click();
    await expect(page).toHaveURL(/\/jobs\/\d+$/);
    await expect(page.getByRole('heading', { level: 1 })).toContainText('Wren Castellane');

    // A file with an unknown section on line 3: nothing is imported and the row is named.
    const upload = page.getByLabel('Cut list file');
    await upload.setInputFiles(
      csvFile('shed.csv', [
        'section,length,quantity,label',
        'T47100,2400,6,stud',
        'Oak beam,1200,2,rail',
        'CLS3889,"7\' 8 5/8""",2,door stud',
      ]),
    );
    const errors = page.getByTestId('import-errors');
    await expect(errors).toContainText('Nothing was saved');
    await expect(page.getByTestId('import-error').first()).toContainText(
      'Line 3, section: Unknown section "Oak beam"',
    );
    await expect(page.getByTestId('item-row')).toHaveCount(0);

    await upload.setInputFiles(
      csvFile('shed-fixed.csv', [
        'section,length,quantity,label',
        'T47100,2400,6,stud',
        'T47100,1.2m,2,rail',
        'CLS3889,"7\' 8 5/8""",2,door stud',
      ]),
    );
    await expect(page.getByTestId('import-done')).toContainText('Imported 3 rows');
    await expect(page.getByTestId('item-row')).toHaveCount(3);
    // 7'-8 5/8" = 2352.675 mm, stored as 2353 (1 in = 25.4 mm exactly).
    await expect(page.getByTestId('items-table')).toContainText('2353 mm');

    await page.getByRole('button', { name: 'Plan this job' }).click();
    await expect(page).toHaveURL(/\/plans\/\d+$/, { timeout: 60_000 });
    await expect(page.getByTestId('board-diagram').first()).toBeVisible();
    await expect(page.getByTestId('diagram-legend')).toContainText('Scrap');
    await expect(page.getByTestId('plan-gap')).toBeVisible();
    // The page shows the price the plan stored in whole pence, written as pounds and pence.
    const stored = (await (await page.request.get(`/api/plans/${page.url().split('/').pop()}`)).json()) as {
      pricePence: number;
      price: { totalPence: number };
    };
    expect(stored.price.totalPence).toBe(stored.pricePence);
    const pounds = (stored.pricePence / 100).toLocaleString('en-GB', { minimumFractionDigits: 2 });
    await expect(page.getByTestId('plan-total-price')).toHaveText(`£${pounds}`);

    const reference = (await page.getByRole('link', { name: /Wren Castellane/ }).textContent())!
      .split(' · ')[0]
      .trim();
    await page
      .getByTestId('email-sheet-form')
      .getByRole('button', { name: 'E-mail quote and cut sheet' })
      .click();
    await expect(page.getByTestId('email-result')).toContainText('sent to wren@example.com');
    const mail = (await caughtMail()).find((m) => m.subject.includes(reference));
    expect(mail?.to).toEqual(['wren@example.com']);
    expect(mail?.attachments[0]).toMatchObject({ contentType: 'application/pdf' });

    // Cut timber cannot be returned: release waits for the customer to accept and pay.
    await page.getByRole('button', { name: 'Release to the saw' }).click();
    await expect(page.getByTestId('release-error')).toContainText('has not accepted the quote');
    await acceptAndPayDeposit(page.request, Number(page.url().split('/').pop()));
    await page.getByRole('button', { name: 'Release to the saw' }).click();
    await expect(page.getByText('Released to the saw')).toBeVisible();
    await page.getByRole('button', { name: 'Take back from the saw' }).click();
    await expect(page.getByRole('button', { name: 'Release to the saw' })).toBeVisible();
  });

  test('the job list filters by status and search text', async ({ page }) => {
    await signIn(page, DEMO.hand);
    const table = page.getByTestId('jobs-table');
    await expect(table).toContainText('J-1001');
    await page.getByLabel('Status').selectOption('cancelled');
    // The demo's cancelled job is listed; other tests may have cancelled more, and every row shown is cancelled.
    await expect(table).toContainText('Cobb Lane Allotments');
    await expect(table).not.toContainText('J-1001');
    const statuses = await table.locator('tbody tr td:nth-child(5)').allInnerTexts();
    expect(statuses.length).toBeGreaterThan(0);
    expect(statuses.every((s) => s.trim() === 'cancelled')).toBe(true);
    await page.getByLabel('Status').selectOption('');
    // J-1002 may be done by now (the saw tests cut it): search every job, not only open ones.
    await page.getByTestId('job-show').selectOption('all');
    await page.getByLabel('Reference or customer').fill('fenwick');
    await expect(table.locator('tbody tr')).toHaveCount(1);
    await expect(table).toContainText('J-1002');
  });

  test('a saw operator cannot plan or import through the API', async ({ page }) => {
    await signIn(page, DEMO.saw);
    expect((await page.request.post('/api/jobs/1/plans', { data: {} })).status()).toBe(403);
    expect(
      (
        await page.request.post('/api/jobs/1/items/import', {
          data: 'section,length,quantity\nT47100,900,1',
          headers: { 'content-type': 'text/csv' },
        })
      ).status(),
    ).toBe(403);
  });
});
