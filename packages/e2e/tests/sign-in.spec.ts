import { expect, test } from '@playwright/test';

test('a builder signs in through the local provider and sees their name in the header', async ({ page }, testInfo) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Plan library' })).toBeVisible();
  await page.getByRole('link', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: 'Sign in to Jigwright' })).toBeVisible();
  await page.getByRole('link', { name: 'Continue with GitHub' }).click();

  await expect(page.getByRole('heading', { name: 'Choose a demo account' })).toBeVisible();
  await page.getByRole('button', { name: 'Sign in as demo-builder' }).click();

  await expect(page.getByTestId('member-name')).toHaveText('Tomas Quillfeather');
  const navigation = page.getByRole('navigation', { name: 'Main' });
  await expect(navigation.getByRole('link', { name: 'My workshop', exact: true })).toBeVisible();
  // A builder is no moderator: the review desk stays out of the navigation (plans in the library may
  // mention it in their titles, so only the navigation is searched).
  await expect(navigation.getByRole('link', { name: 'Review desk', exact: true })).toHaveCount(0);
  await testInfo.attach('signed-in', { body: await page.screenshot({ fullPage: true }), contentType: 'image/png' });
});

test('a cancelled sign-in comes back with a clear message and no session', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Continue with GitHub' }).click();
  await page.getByRole('button', { name: 'Cancel sign-in' }).click();
  await expect(page.getByRole('alert')).toContainText('The sign-in was cancelled');
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
});

test('an unknown address shows the not-found page inside the app', async ({ page }) => {
  const response = await page.goto('/no/such/page');
  expect(response?.status()).toBe(200);
  await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible();
});
