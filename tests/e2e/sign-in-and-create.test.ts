// Browser end-to-end: a project owner signs in, creates a project and a figure in it through the
// dialogs, and finds both listed. Runs the built client against the real server and database.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const OWNER = 'ada.okafor@harrowgate.example';
const NEW_PROJECT = 'Orbitals workshop — spring term';
const NEW_FIGURE = 'The 3d_xz orbital in the xz plane';

describe('signing in and creating a project and a figure', () => {
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

  it('when a visitor opens the site, then they are sent to the sign-in page', async () => {
    await page.goto(`${stack.baseUrl}/`);
    await page.waitForURL('**/sign-in');
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toBe(
      'Sign in to Lobewright',
    );
  });

  it('when the form is sent empty, then each field says what is missing', async () => {
    await page.getByRole('button', { name: 'Sign in' }).click();
    const email = page.getByLabel('E-mail');
    await expect(email.getAttribute('aria-invalid')).resolves.toBe('true');
    await expect(page.getByLabel('Password').getAttribute('aria-invalid')).resolves.toBe('true');
  });

  it('when the owner signs in, then both demo projects are listed with their role', async () => {
    await signIn(page, stack.baseUrl, OWNER);
    const projects = page.getByRole('list', { name: 'Projects' });
    await projects
      .getByRole('link', { name: 'Atoms & Bonds — Chapter 4: The Hydrogen Atom' })
      .waitFor();
    await projects.getByRole('link', { name: 'CHEM 1020 — Fennwick College lectures' }).waitFor();
    expect(await projects.getByText('Your role: Owner', { exact: true }).count()).toBe(2);
  });

  it('when the owner creates a project, then its page opens with an empty figure table', async () => {
    await page.getByRole('button', { name: 'New project' }).click();
    const dialog = page.getByRole('dialog', { name: 'New project' });
    await dialog.getByLabel('Project name').fill(NEW_PROJECT);
    await dialog.getByLabel('Description').fill('Figures for the hands-on orbital sessions.');
    await dialog.getByRole('button', { name: 'Create project' }).click();
    await page.getByRole('heading', { level: 1, name: NEW_PROJECT }).waitFor();
    await page.getByText('No figures yet.').waitFor();
  });

  it('when n is 1, then the only choices are l = 0 and m = 0', async () => {
    await page.getByRole('button', { name: 'New figure' }).click();
    const dialog = page.getByRole('dialog', { name: 'New figure' });
    await dialog.getByLabel('n (shell)').selectOption('1');
    expect(await dialog.getByLabel('l (subshell)').locator('option').allTextContents()).toEqual([
      '0 (s)',
    ]);
    expect(
      await dialog.getByLabel('m', { exact: true }).locator('option').allTextContents(),
    ).toEqual(['0']);
  });

  it('when the owner creates a 2D slice of 3d_xz, then the figure page describes it', async () => {
    const dialog = page.getByRole('dialog', { name: 'New figure' });
    await dialog.getByLabel('Number').fill('1.1');
    await dialog.getByLabel('Title').fill(NEW_FIGURE);
    await dialog.getByRole('radio', { name: /2D slice/ }).check();
    await dialog.getByLabel('n (shell)').selectOption('3');
    await dialog.getByLabel('l (subshell)').selectOption('2');
    await dialog.getByLabel('m', { exact: true }).selectOption('1');
    await dialog.getByRole('button', { name: 'Create figure' }).click();

    await page.getByRole('heading', { level: 1, name: new RegExp(NEW_FIGURE) }).waitFor();
    const summary = page.getByRole('region', { name: 'What the figure shows' });
    await summary.getByText('2D slice', { exact: true }).waitFor();
    await summary.getByText(/^3d_xz \(n = 3, l = 2, m = 1\)/).waitFor();
    await page
      .getByRole('region', { name: 'Revisions' })
      .getByRole('rowheader', { name: /^1/ })
      .waitFor();
    await saveScreenshot(page, 'figure-page');
  });

  it('when the owner goes back to the project, then the figure is in its table', async () => {
    await page
      .getByRole('navigation', { name: 'Breadcrumb' })
      .getByRole('link', { name: NEW_PROJECT })
      .click();
    const table = page.getByRole('table', { name: /Figures in this project/ });
    const row = table.getByRole('row', { name: new RegExp(NEW_FIGURE) });
    await row.waitFor();
    expect(await row.getByRole('cell').allTextContents()).toEqual(
      expect.arrayContaining(['1.1', '2D slice', 'Draft', '1']),
    );
    await saveScreenshot(page, 'project-figures');
  });

  it('when the owner returns to the project list, then the new project shows one figure', async () => {
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Projects' })
      .click();
    const card = page
      .getByRole('listitem')
      .filter({ has: page.getByRole('link', { name: NEW_PROJECT }) });
    await card.getByText('1 figure', { exact: true }).waitFor();
    await saveScreenshot(page, 'sign-in-and-create');
    expect(problems).toEqual([]);
  });
});
