// Signs in through the form, as a person would, and waits for the project list.
import type { Page } from 'playwright-core';

export const DEMO_PASSWORD = 'lobewright-demo';

export async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1, name: 'Projects' }).waitFor();
}
