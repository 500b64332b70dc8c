import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test, type APIRequestContext } from '@playwright/test';
import { signInAs } from './sign-in-as';

// The demo crosscut sled's r1 drawing (plans-seed, written by tools/drawings).
const DRAWING = readFileSync(join(__dirname, '../../../plans-seed/plans/five-cut-crosscut-sled/r1/sled.dxf'));
const CSRF = { 'X-Requested-With': 'jigwright' };

interface Revision {
  updatedAt: string;
  drawings: Array<{ status: string }>;
}

/** A plan with its r1 submitted, made through the API with the designer's session, as the editor would. */
async function submitPlan(api: APIRequestContext, title: string): Promise<string> {
  const created = await api.post('/api/plans', {
    headers: CSRF,
    data: {
      title,
      summary: 'A crosscut sled squared with the five-cut check, for the review desk test.',
      category: 'sled',
      tags: ['sled'],
      toolsNeeded: ['table-saw'],
      licence: 'CC-BY-4.0',
      motorised: false,
    },
  });
  expect(created.status()).toBe(201);
  const { slug } = (await created.json()) as { slug: string };
  const revisionUrl = `/api/plans/${slug}/revisions/1`;
  const uploaded = await api.post(`${revisionUrl}/drawings`, {
    headers: CSRF,
    multipart: { file: { name: 'sled.dxf', mimeType: 'application/dxf', buffer: DRAWING } },
  });
  expect(uploaded.status()).toBe(201);
  let revision: Revision;
  await expect
    .poll(
      async () => {
        revision = (await (await api.get(revisionUrl)).json()) as Revision;
        return revision.drawings.map((drawing) => drawing.status);
      },
      { timeout: 30_000 },
    )
    .toEqual(['done']);
  const saved = await api.patch(revisionUrl, {
    headers: CSRF,
    data: { expectedUpdatedAt: revision!.updatedAt, safetyNotes: 'Keep the blade guard on; push from behind.' },
  });
  expect(saved.status()).toBe(200);
  expect((await api.post(`${revisionUrl}/submit`, { headers: CSRF })).status()).toBe(200);
  return slug;
}

test('a moderator publishes one submission, which then shows in the library, and sends another back with notes', async ({
  browser,
}, testInfo) => {
  const stamp = Date.now().toString(36);
  const toPublish = `Review desk sled ${stamp}`;
  const toSendBack = `Review desk jig ${stamp}`;
  const designer = await (await browser.newContext()).newPage();
  await signInAs(designer, 'demo-designer');
  const publishSlug = await submitPlan(designer.request, toPublish);
  const sendBackSlug = await submitPlan(designer.request, toSendBack);

  const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await signInAs(page, 'demo-moderator');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review desk' }).click();
  await expect(page.getByRole('heading', { name: 'Review desk', level: 1 })).toBeVisible();
  const queued = page.getByRole('link', { name: `${toPublish}, r1` });
  await expect(queued).toBeVisible();
  await expect(page.getByRole('list', { name: `Checklist of ${toPublish}, r1` })).toContainText('OKDrawing analysed');
  await testInfo.attach('the review desk', {
    body: await page.screenshot({ fullPage: true }),
    contentType: 'image/png',
  });

  await queued.click();
  await expect(page.getByRole('heading', { name: `${toPublish}, r1`, level: 1 })).toBeVisible();
  await expect(page.getByRole('region', { name: 'Cut list' })).toBeVisible();
  await page.getByRole('button', { name: 'Publish' }).click();
  const publishDialog = page.getByRole('dialog');
  await publishDialog.getByLabel(/A note to the designer/).fill('Clear drawing and notes, thank you.');
  await testInfo.attach('publishing', { body: await page.screenshot(), contentType: 'image/png' });
  await publishDialog.getByRole('button', { name: 'Publish' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'is published and in the library' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Send back' })).toHaveCount(0);

  await page.goto('/');
  await page.getByLabel('Search plans').fill(toPublish);
  await page.getByRole('button', { name: 'Search', exact: true }).click();
  await expect(page.getByRole('link', { name: toPublish })).toBeVisible();

  // On the plan page a moderator can hide the published revision, with a reason, and restore it.
  await page.getByRole('link', { name: toPublish }).click();
  await page.getByRole('button', { name: 'Hide this revision' }).click();
  const hideDialog = page.getByRole('dialog');
  await hideDialog.getByLabel(/Reason/).fill('A member showed that the fence is drawn 10 mm short.');
  await hideDialog.getByRole('button', { name: 'Hide revision' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'is hidden: visitors no longer see it' })).toBeVisible();
  await expect(page.getByText('r1 is hidden: only its designer and the moderators see it.')).toBeVisible();
  expect((await page.request.get(`/api/plans/${publishSlug}/revisions/1`)).status()).toBe(200);
  const visitor = await browser.newContext();
  expect((await visitor.request.get(`/api/plans/${publishSlug}`)).status()).toBe(404);
  await testInfo.attach('hidden on the plan page', { body: await page.screenshot(), contentType: 'image/png' });
  await page.getByRole('button', { name: 'Restore' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Restore' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'is restored' })).toBeVisible();
  expect((await visitor.request.get(`/api/plans/${publishSlug}`)).status()).toBe(200);

  await page.goto('/review');
  await expect(page.getByRole('link', { name: `${toPublish}, r1` })).toHaveCount(0);
  await page.getByRole('link', { name: `${toSendBack}, r1` }).click();
  await page.getByRole('button', { name: 'Send back' }).click();
  const sendBackDialog = page.getByRole('dialog');
  await sendBackDialog.getByRole('button', { name: 'Send back' }).click();
  await expect(sendBackDialog.getByText('Write what the designer should change.')).toBeVisible();
  const notes = 'The fence is drawn on a layer without a thickness; put it on an 18 mm layer.';
  await sendBackDialog.getByLabel(/What to change/).fill(notes);
  await sendBackDialog.getByRole('button', { name: 'Send back' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'is sent back to its designer' })).toBeVisible();
  await testInfo.attach('sent back', { body: await page.screenshot({ fullPage: true }), contentType: 'image/png' });
  await page.setViewportSize({ width: 390, height: 844 });
  await testInfo.attach('sent back, on a phone', { body: await page.screenshot(), contentType: 'image/png' });
  await page.goto('/review');
  await expect(page.getByRole('heading', { name: 'Review desk', level: 1 })).toBeVisible();
  await expect(page.getByRole('link', { name: `${toSendBack}, r1` })).toHaveCount(0);
  await testInfo.attach('the review desk, on a phone', { body: await page.screenshot(), contentType: 'image/png' });

  // The designer reads the notes in the revision's decision history, and may edit the revision again.
  const history = (await (
    await designer.request.get(`/api/plans/${sendBackSlug}/revisions/1/decisions`)
  ).json()) as Array<{
    decision: string;
    notes: string;
  }>;
  expect(history.map((entry) => [entry.decision, entry.notes])).toEqual([['send-back', notes]]);
  const sentBack = (await (await designer.request.get(`/api/plans/${sendBackSlug}/revisions/1`)).json()) as {
    state: string;
    editable: boolean;
  };
  expect(sentBack).toMatchObject({ state: 'sent-back', editable: true });
});
