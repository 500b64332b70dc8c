import { expect, test, type Page } from '@playwright/test';
import { signInAs } from './sign-in-as';

async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Member menu for / }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
}

async function menuItems(page: Page): Promise<string[]> {
  await page.getByRole('button', { name: /^Member menu for / }).click();
  const items = (await page.getByRole('menuitem').allInnerTexts()).map((text) => text.trim());
  await page.keyboard.press('Escape');
  return items;
}

async function navigation(page: Page): Promise<string[]> {
  return (await page.getByRole('navigation', { name: 'Main' }).getByRole('link').allInnerTexts()).map((t) => t.trim());
}

const ROLES = [
  {
    login: 'demo-designer',
    nav: ['Library', 'Calculators', 'My workshop'],
    menu: ['My workshop', 'New plan', 'My profile', 'Settings', 'Sign out'],
  },
  {
    login: 'demo-builder',
    nav: ['Library', 'Calculators', 'My workshop'],
    menu: ['My workshop', 'New plan', 'My profile', 'Settings', 'Sign out'],
  },
  {
    login: 'demo-moderator',
    nav: ['Library', 'Calculators', 'Review desk', 'My workshop'],
    menu: ['My workshop', 'New plan', 'My profile', 'Settings', 'Sign out'],
  },
  {
    login: 'demo-admin',
    nav: ['Library', 'Calculators', 'Review desk', 'My workshop'],
    menu: ['My workshop', 'New plan', 'My profile', 'Settings', 'Members', 'Sign out'],
  },
];

test('a visitor is offered the library, the calculators and sign-in only', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
  expect(await navigation(page)).toEqual(['Library', 'Calculators']);
});

for (const { login, nav, menu } of ROLES) {
  test(`${login} sees what their role offers in the navigation and the member menu`, async ({ page }) => {
    await signInAs(page, login);
    expect(await navigation(page)).toEqual(nav);
    expect(await menuItems(page)).toEqual(menu);
  });
}

test('an admin makes demo-builder a moderator, who then has the review desk, and takes it back', async ({
  browser,
}, testInfo) => {
  const adminPage = await (await browser.newContext()).newPage();
  await signInAs(adminPage, 'demo-admin');
  await adminPage.getByRole('button', { name: /^Member menu for / }).click();
  await adminPage.getByRole('menuitem', { name: 'Members' }).click();
  await expect(adminPage.getByRole('heading', { name: 'Members', level: 1 })).toBeVisible();

  await adminPage.getByLabel('Search members').fill('demo-builder');
  const row = adminPage.getByRole('row').filter({ hasText: '@demo-builder' });
  await expect(row).toHaveCount(1);
  await expect(adminPage.getByRole('row')).toHaveCount(2);
  await row.getByRole('button', { name: 'Make Tomas Quillfeather a moderator' }).click();

  const dialog = adminPage.getByRole('alertdialog');
  await expect(dialog.getByRole('heading', { name: 'Make Tomas Quillfeather a moderator?' })).toBeVisible();
  await testInfo.attach('confirm-dialog', { body: await adminPage.screenshot(), contentType: 'image/png' });
  await dialog.getByRole('button', { name: 'Make moderator' }).click();
  await expect(adminPage.getByRole('status')).toHaveText('Tomas Quillfeather is now a moderator.');
  await expect(row.getByText('Moderator', { exact: true })).toBeVisible();
  await expect(adminPage.getByRole('list', { name: 'Recent role and status changes' })).toContainText(
    'Bram Okafor-Lindqvist made Tomas Quillfeather a moderator',
  );
  await testInfo.attach('members-page', {
    body: await adminPage.screenshot({ fullPage: true }),
    contentType: 'image/png',
  });

  const builderPage = await (await browser.newContext()).newPage();
  await signInAs(builderPage, 'demo-builder');
  await builderPage.getByRole('link', { name: 'Review desk' }).click();
  await expect(builderPage.getByRole('heading', { name: 'Review desk' })).toBeVisible();

  // Leave demo-builder as the seed made them: sign-in.spec.ts expects no review desk for them.
  await row.getByRole('button', { name: 'Remove moderator role from Tomas Quillfeather' }).click();
  await dialog.getByRole('button', { name: 'Remove moderator role' }).click();
  await expect(adminPage.getByRole('status')).toHaveText('Tomas Quillfeather is no longer a moderator.');
  await builderPage.goto('/');
  await expect(builderPage.getByRole('link', { name: 'My workshop' })).toBeVisible();
  await expect(builderPage.getByRole('link', { name: 'Review desk' })).toHaveCount(0);
  await signOut(builderPage);
  await signOut(adminPage);
});

test('a member changes their display name and units in Settings and sees them on their profile', async ({
  page,
}, testInfo) => {
  await signInAs(page, 'demo-designer');
  await page.getByRole('button', { name: /^Member menu for / }).click();
  await page.getByRole('menuitem', { name: 'Settings' }).click();
  await expect(page.getByRole('heading', { name: 'Settings', level: 1 })).toBeVisible();
  await page.getByLabel('Display name').fill('Ilse V. Brandt');
  await page.getByText('Inches').click();
  await page.getByText('Someone adapts my plan').click();
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByRole('status')).toHaveText('Settings saved.');
  await expect(page.getByTestId('member-name')).toHaveText('Ilse V. Brandt');
  await testInfo.attach('settings', { body: await page.screenshot({ fullPage: true }), contentType: 'image/png' });

  await page.reload();
  await expect(page.getByLabel('Display name')).toHaveValue('Ilse V. Brandt');
  await expect(page.getByRole('radio', { name: /Inches/ })).toBeChecked();
  await expect(page.getByRole('checkbox', { name: 'Someone adapts my plan' })).not.toBeChecked();

  await page.getByRole('button', { name: /^Member menu for / }).click();
  await page.getByRole('menuitem', { name: 'My profile' }).click();
  await expect(page.getByRole('heading', { name: 'Ilse V. Brandt', level: 1 })).toBeVisible();
  await expect(page.getByText('You have not published a plan yet')).toBeVisible();
  await expect(page.getByText('You have not reported a build yet')).toBeVisible();
  await testInfo.attach('profile', { body: await page.screenshot({ fullPage: true }), contentType: 'image/png' });

  // Put the seed's name back for the specs that follow.
  await page.goto('/settings');
  await page.getByLabel('Display name').fill('Ilse Varga-Brandt');
  await page.getByText('Millimetres').click();
  await page.getByText('Someone adapts my plan').click();
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByTestId('member-name')).toHaveText('Ilse Varga-Brandt');
});

test('a member who is no admin is kept from the Members page', async ({ page }) => {
  await signInAs(page, 'demo-moderator');
  await page.goto('/members');
  await expect(page.getByRole('heading', { name: 'Not open to you' })).toBeVisible();
  await expect(page.getByRole('alert')).toContainText('The Members page is for admins.');
});
