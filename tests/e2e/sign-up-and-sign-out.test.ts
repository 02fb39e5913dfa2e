// Browser end-to-end: a newcomer creates an account while sign-up is open, signs out, and a
// member following a deep link is brought back to it after signing in.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, watchForProblems } from './support/chromium';
import { DEMO_PASSWORD } from './support/sign-in';

describe('signing up, signing out and deep links', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  let page: Page;
  let problems: string[];

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    problems = watchForProblems(page);
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  it('when a newcomer picks a short password, then the password field says how long it must be', async () => {
    await page.goto(`${stack.baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByRole('heading', { level: 1, name: 'Create an account' }).waitFor();
    await page.getByLabel('Name').fill('Priya Natarajan');
    await page.getByLabel('E-mail').fill('priya.natarajan@example.org');
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('Must be at least 10 characters').waitFor();
    expect(await page.getByLabel('Password').getAttribute('aria-invalid')).toBe('true');
  });

  it('when the newcomer signs up properly, then they arrive at an empty project list', async () => {
    await page.getByLabel('Password').fill('a-long-enough-password');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { level: 1, name: 'Projects' }).waitFor();
    await page.getByText('No projects yet.', { exact: false }).waitFor();
    await page.getByText('Priya Natarajan').waitFor();
  });

  it('when they sign out, then the sign-in page shows and the projects are out of reach', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/sign-in');
    await page.goto(`${stack.baseUrl}/`);
    await page.waitForURL('**/sign-in');
  });

  it('when a member opens a project link while signed out, then after signing in they land on it', async () => {
    await page.goto(`${stack.baseUrl}/projects/1/members`);
    await page.waitForURL('**/sign-in');
    await page.getByLabel('E-mail').fill('ravi.mendes@harrowgate.example');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/projects/1/members');
    await page.getByRole('heading', { level: 2, name: 'Members' }).waitFor();
    expect(problems).toEqual([]);
  });
});
