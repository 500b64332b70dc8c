import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';

test('a visitor searches and filters the library, opens a plan, switches units, views it in 3D and downloads its cut list', async ({
  page,
}, testInfo) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Plan library' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Crosscut sled squared by the five-cut check' })).toBeVisible();

  await page.getByLabel('Search plans').fill('sled');
  await page.getByRole('button', { name: 'Search', exact: true }).click();
  await expect(page).toHaveURL(/[?&]q=sled/);
  await expect(page.getByRole('link', { name: 'Crosscut sled squared by the five-cut check' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Hinged two-arm taper jig' })).toHaveCount(0);

  await page.getByLabel('Category').selectOption({ label: 'taper jig' });
  await expect(page).toHaveURL(/[?&]category=taper-jig/);
  await expect(page.getByText('No plans match')).toBeVisible();
  // The filters live in the address, so the back button undoes the last one.
  await page.goBack();
  await expect(page.getByRole('link', { name: 'Crosscut sled squared by the five-cut check' })).toBeVisible();

  await page.getByRole('link', { name: 'Crosscut sled squared by the five-cut check' }).click();
  await expect(
    page.getByRole('heading', { name: 'Crosscut sled squared by the five-cut check', level: 1 }),
  ).toBeVisible();
  await expect(page.getByText('Safety notes').first()).toBeVisible();

  const sledBase = page.getByRole('row', { name: /Sled base/ }).first();
  await expect(sledBase).toContainText('mm');
  await page.getByRole('button', { name: 'Inches' }).click();
  await expect(page).toHaveURL(/[?&]units=in/);
  await expect(sledBase).toContainText(' in');

  await page.getByRole('button', { name: /Show in 3D/ }).click();
  await expect(page.getByTestId('preview-3d-canvas')).toBeVisible({ timeout: 20_000 });
  await page.waitForTimeout(1000);
  await testInfo.attach('plan in 3D', { body: await page.screenshot({ fullPage: false }), contentType: 'image/png' });

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download CSV' }).click();
  const csv = readFileSync((await (await download).path()) as string, 'utf8');
  expect(csv.split(/\r?\n/)[0]).toContain('part,quantity');
  expect(csv).toContain('Sled base');
});
