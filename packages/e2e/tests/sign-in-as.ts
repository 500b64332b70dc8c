import { expect, type Page } from '@playwright/test';

/** Signs in through the local provider's account picker, from the header's Sign in link. */
export async function signInAs(page: Page, login: string): Promise<void> {
  await page.goto('/');
  await page.getByRole('link', { name: 'Sign in' }).click();
  await page.getByRole('link', { name: 'Continue with GitHub' }).click();
  await page.getByRole('button', { name: `Sign in as ${login}` }).click();
  await expect(page.getByTestId('member-name')).toBeVisible();
}
