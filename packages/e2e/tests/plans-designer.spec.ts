import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './sign-in-as';

// A demo drawing of our own (plans-seed, written by tools/drawings): a T-square guide in mm.
const DRAWING = join(__dirname, '../../../plans-seed/plans/t-square-dado-guide/r1/dado-guide.dxf');

/** The drop area's file field (the visible button opens it). */
const drawingPicker = (page: Page) =>
  page.getByRole('region', { name: 'Drawings' }).locator('input[type="file"]').first();

/** Fills the new-plan form and lands in the editor of its r1. */
async function createPlan(page: Page, title: string): Promise<string> {
  await page.goto('/workshop');
  await page.getByRole('link', { name: 'New plan' }).first().click();
  await expect(page.getByRole('heading', { name: 'New plan', level: 1 })).toBeVisible();
  await page.getByRole('textbox', { name: /^Title/ }).fill(title);
  await page
    .getByRole('textbox', { name: /^Summary/ })
    .fill('A T-square that guides the router across a panel for dadoes.');
  await page.getByRole('combobox', { name: /^Category/ }).selectOption({ label: 'router jig' });
  await page.getByRole('combobox', { name: /^Licence/ }).selectOption({ label: 'CC BY 4.0' });
  await page.getByRole('textbox', { name: /^Tags/ }).fill('dado, shelves');
  await page.getByRole('checkbox', { name: 'router', exact: true }).check();
  await page.getByRole('button', { name: 'Create the plan' }).click();
  await expect(page).toHaveURL(/\/plans\/[^/]+\/r\/1\/edit$/);
  await expect(page.getByText('r1 · Draft')).toBeVisible();
  return new URL(page.url()).pathname;
}

test('a designer creates a plan, uploads a drawing, edits a part, adds hardware and notes, and submits it', async ({
  page,
}, testInfo) => {
  await signInAs(page, 'demo-designer');
  await createPlan(page, 'T-square dado guide for shelves');

  // Submitting an empty draft lists what is missing.
  await page.getByRole('button', { name: 'Submit for review' }).click();
  await expect(page.getByRole('list', { name: 'What is missing' })).toContainText('Upload a drawing');

  await drawingPicker(page).setInputFiles(DRAWING);
  const drawing = page.getByRole('listitem', { name: 'dado-guide.dxf' });
  await expect(drawing.getByText('Analysed')).toBeVisible({ timeout: 30_000 });
  const parts = page.getByRole('list', { name: 'Parts' });
  await expect(parts.getByRole('listitem')).not.toHaveCount(0);
  await testInfo.attach('drawing analysed, parts shown', {
    body: await page.screenshot({ fullPage: true }),
    contentType: 'image/png',
  });

  // The same file again is refused, with the reason.
  await drawingPicker(page).setInputFiles(DRAWING);
  await expect(page.getByRole('list', { name: 'Uploads' })).toContainText('already on this revision');

  const firstName = await parts
    .getByRole('textbox', { name: /^Name of / })
    .first()
    .inputValue();
  const material = parts.getByRole('textbox', { name: `Material of ${firstName}` });
  await material.fill('hard maple');
  await parts.getByRole('button', { name: `Save ${firstName}` }).click();
  await expect(parts.getByRole('button', { name: `Save ${firstName}` })).toBeDisabled();
  await page.reload();
  await expect(
    page.getByRole('list', { name: 'Parts' }).getByRole('textbox', { name: `Material of ${firstName}` }),
  ).toHaveValue('hard maple');

  await page.getByRole('button', { name: 'Add a hardware row' }).click();
  const row = page.getByRole('listitem', { name: 'Hardware row 1' });
  await row.getByLabel('Item').fill('Flat-head wood screw');
  await row.getByLabel('Specification').fill('4 × 40 mm');
  await row.getByLabel('Quantity').fill('4');
  await page.getByRole('textbox', { name: 'Build notes' }).fill('## Fence\n\nGlue the fence square to the base.');
  await page.getByRole('textbox', { name: 'Safety notes' }).fill('Clamp the guide before switching the router on.');
  const notes = page.getByRole('region', { name: 'Build notes' });
  await notes.getByRole('tab', { name: 'Preview' }).click();
  await expect(notes.getByRole('heading', { name: 'Fence' })).toBeVisible();

  await page.getByRole('button', { name: 'Submit for review' }).click();
  await expect(page.getByText('r1 · Waiting for review')).toBeVisible();
  await expect(page.getByText('Submitted for review.')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Withdraw to edit' })).toBeVisible();
  await testInfo.attach('submitted for review', {
    body: await page.screenshot({ fullPage: true }),
    contentType: 'image/png',
  });

  await page.goto('/workshop');
  const listed = page.getByRole('listitem', { name: 'T-square dado guide for shelves' });
  await expect(listed.getByText('Waiting for review')).toBeVisible();
});

test('a save from a second tab that loaded the draft earlier gets the 409 message and keeps its text', async ({
  page,
  context,
}) => {
  await signInAs(page, 'demo-designer');
  const editor = await createPlan(page, 'Bench hook for a tenon saw');
  const second = await context.newPage();
  await second.goto(editor);
  await expect(second.getByRole('textbox', { name: 'Build notes' })).toBeVisible();

  await page.getByRole('textbox', { name: 'Build notes' }).fill('Written in the first tab.');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByText('All changes saved')).toBeVisible();

  const notes = second.getByRole('textbox', { name: 'Build notes' });
  await notes.fill('Written in the second tab.');
  await second.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(second.getByText('This draft was saved in another tab or window after you opened it.')).toBeVisible();
  await expect(notes).toHaveValue('Written in the second tab.');

  await second.getByRole('button', { name: 'Reload, keep my text' }).click();
  await expect(notes).toHaveValue('Written in the second tab.');
  await second.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(second.getByText('All changes saved')).toBeVisible();
  await page.reload();
  await expect(page.getByRole('textbox', { name: 'Build notes' })).toHaveValue('Written in the second tab.');
});

test('an upload shows its progress and Cancel leaves nothing on the revision', async ({ page, context }) => {
  await signInAs(page, 'demo-designer');
  await createPlan(page, 'Drilling guide for shelf pins');
  // A valid ASCII DXF of about 3 MB (a long comment after the header), sent over a slowed link.
  const header = readFileSync(DRAWING, 'latin1');
  const big = Buffer.from(`${header}999\n${'x'.repeat(3 * 1024 * 1024)}\n`, 'latin1');
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: 20,
    downloadThroughput: -1,
    uploadThroughput: 256 * 1024,
  });

  await drawingPicker(page).setInputFiles({ name: 'slow.dxf', mimeType: 'application/dxf', buffer: big });
  const upload = page.getByRole('list', { name: 'Uploads' }).getByRole('listitem', { name: 'slow.dxf' });
  const bar = upload.getByRole('progressbar', { name: 'Upload of slow.dxf' });
  await expect(bar).toBeVisible();
  await expect
    .poll(async () => Number(await bar.getAttribute('aria-valuenow')), { timeout: 20_000 })
    .toBeGreaterThan(0);
  await page.getByRole('button', { name: 'Cancel the upload of slow.dxf' }).click();
  await expect(upload).toHaveCount(0);

  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: 0,
    downloadThroughput: -1,
    uploadThroughput: -1,
  });
  await page.reload();
  await expect(page.getByText('No drawings yet.')).toBeVisible();
});
