import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';

test('a builder lays out a finger joint, switches units, meets a bad value and downloads the CSV', async ({
  page,
}, testInfo) => {
  await page.goto('/');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculators' }).click();
  await page.getByRole('link', { name: 'Finger joints' }).click();
  await expect(page.getByRole('heading', { name: 'Finger joints', level: 1 })).toBeVisible();
  await expect(page.getByRole('region', { name: 'Caution: powered saw or router' })).toContainText(
    "tool maker's instructions come first",
  );

  await page.getByLabel('Board width').fill('200');
  await page.getByLabel('Pin width').fill('16');
  await page.getByLabel('Kerf (cutter width)').fill('5');
  await expect(page).toHaveURL(/width=200&pin=16&kerf=5/);

  const table = page.getByRole('table', { name: 'Cut table' });
  const rows = table.locator('tbody tr');
  const passRects = page.locator('svg[data-board] rect[data-pass]');
  // The plan follows the form a moment after the URL does: wait for it before counting.
  // Board A starts with a 16 mm pin, so its first pass sits flush with the slot's left side at 16 mm.
  await expect(rows.first().locator('td').nth(3)).toHaveText('16.000 mm');
  await expect(page.getByRole('figure')).toContainText('across the 200 mm');
  await expect(page.getByRole('figure')).toContainText('passes (5 mm');
  // One drawn pass per row of the table, board by board.
  await expect(rows).toHaveCount(await passRects.count());
  for (const board of ['A', 'B']) {
    await expect(rows.filter({ has: page.locator('td:first-child', { hasText: board }) })).toHaveCount(
      await page.locator(`svg[data-board="${board}"] rect[data-pass]`).count(),
    );
  }
  const firstPass = await rows.first().textContent();

  await page.getByRole('radiogroup', { name: 'Units' }).getByText('in', { exact: true }).click();
  await expect(page).toHaveURL(/units=in/);
  // 200 mm / 25.4 = 7.8740 in, written to four decimals.
  await expect(page.getByLabel('Board width')).toHaveValue('7.874');
  await expect(rows.first()).toHaveText(firstPass ?? '');

  const kerf = page.getByLabel('Kerf (cutter width)');
  await kerf.fill('0');
  await expect(page.getByText('Kerf (cutter width) must be more than 0.')).toBeVisible();
  await expect(kerf).toHaveAttribute('aria-invalid', 'true');
  // The last good picture stays, marked as out of date, and the downloads wait.
  await expect(page.locator('svg[data-board]')).toHaveCount(2);
  await expect(page.getByRole('status')).toContainText('last inputs that worked');
  await expect(page.getByRole('button', { name: 'Download CSV' })).toBeDisabled();

  await kerf.fill('3/16');
  await expect(page.getByRole('status')).toHaveCount(0);
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Download CSV' }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/\.csv$/);
  const csv = await readFile((await download.path()) ?? '', 'utf8');
  const lines = csv.trimEnd().split('\r\n');
  expect(lines[0]).toBe('board,slot,pass,position_mm,position_in,steps');
  await expect(rows).toHaveCount(lines.length - 1);

  await testInfo.attach('finger-joints', { body: await page.screenshot({ fullPage: true }), contentType: 'image/png' });
});

test('the link to the inputs opens the same joint', async ({ page }) => {
  await page.goto('/calculators/finger-joints?units=in&start=slot&width=5-1/2&pin=1/2&kerf=1/8');
  await expect(page.getByLabel('Board width')).toHaveValue('5-1/2');
  await expect(
    page.getByRole('radiogroup', { name: 'Board A starts with' }).getByRole('radio', { name: 'Slot' }),
  ).toBeChecked();
  const href = await page.getByRole('link', { name: 'Link to these inputs' }).getAttribute('href');
  const rows = await page.getByRole('table', { name: 'Cut table' }).locator('tbody tr').allTextContents();
  await page.goto(href ?? '/');
  await expect(page.getByRole('table', { name: 'Cut table' }).locator('tbody tr')).toHaveText(rows);
});
