// Browser end-to-end: the editor ticks rows of the figure table and submits them for review at once
// (a figure that cannot be submitted is skipped, with the reason), then deletes one after confirming.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';

describe('bulk actions on the figure table', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  let page: Page;
  let problems: string[];

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    page = await (await browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
    problems = watchForProblems(page);
    await signIn(page, stack.baseUrl, 'ravi.mendes@harrowgate.example');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('heading', { level: 1, name: PROJECT }).waitFor();
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  const row = (title: string) =>
    page.getByRole('table', { name: /Figures in this project/ }).getByRole('row', { name: new RegExp(title) });

  it('when the editor submits a draft and an approved figure together, then the draft goes to review and the other is skipped with the reason', async () => {
    await page.getByRole('checkbox', { name: 'Select figure 4.5: Slice through the 3p_z orbital' }).check();
    await page.getByRole('checkbox', { name: 'Select figure 4.1: The 1s orbital' }).check();
    const selected = page.getByRole('region', { name: 'Selected figures' });
    await selected.getByText('2 figures selected').waitFor();
    await selected.getByRole('button', { name: 'Submit for review' }).click();
    const note = selected.getByRole('status');
    await note.filter({ hasText: /^1 figure submitted for review\. Skipped figure 4\.1: / }).waitFor();
    expect(await note.textContent()).toContain('cannot be submitted');
    await row('Slice through the 3p_z orbital').getByText('In review', { exact: true }).waitFor();
    await row('The 1s orbital').getByText('Approved', { exact: true }).waitFor();
    await saveScreenshot(page, 'review-bulk-submitted');
  });

  it('when the editor deletes a ticked figure, then a dialog names it first and afterwards it is gone', async () => {
    await page.getByRole('button', { name: 'Clear selection' }).click();
    // The outcome belongs to the selection it was for.
    expect(await page.getByText(/submitted for review/).count()).toBe(0);
    await page.getByRole('checkbox', { name: 'Select figure 4.8: The 4f_xyz orbital' }).check();
    await page.getByRole('region', { name: 'Selected figures' }).getByRole('button', { name: 'Delete…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete 1 figure?' });
    await dialog.getByRole('listitem').filter({ hasText: 'The 4f_xyz orbital' }).waitFor();
    await saveScreenshot(page, 'review-bulk-delete-confirm');
    await dialog.getByRole('button', { name: 'Delete 1 figure' }).click();
    await page.getByRole('status').filter({ hasText: '1 figure deleted.' }).waitFor();
    await row('The 4f_xyz orbital').waitFor({ state: 'detached' });
    await page.getByText('7 figures', { exact: true }).waitFor();
    await page.getByText('Tick figures to act on several at once.').waitFor();
    expect(problems).toEqual([]);
  });
});
