// Browser end-to-end: the editor puts the chapter's figures in a new order with the keyboard (Alt+↑
// on a focused row) and by dragging a row, numbers the list in sequence under the chapter prefix,
// edits one number in place, saves, and after reloading finds the order and the numbers kept. Then ticks rows and submits them
// for review at once (one that cannot be submitted is skipped, with the reason) and deletes one after
// confirming.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';
const RADIAL = 'Radial distributions of 1s, 2s and 3s';
const P_ORBITAL = 'The 2p_z orbital';

/** Number and title of each row of the figure table, top to bottom. */
async function tableRows(page: Page): Promise<string[]> {
  const table = page.getByRole('table', { name: /Figures in this project/ });
  await table.getByRole('rowheader').first().waitFor();
  const rows = table.locator('tbody tr');
  const out: string[] = [];
  for (let i = 0; i < (await rows.count()); i++) {
    const cells = rows.nth(i).locator('td');
    const number = (await cells.nth(2).textContent())?.trim() ?? '';
    const title = (await rows.nth(i).getByRole('rowheader').textContent())?.trim() ?? '';
    out.push(`${number} ${title}`);
  }
  return out;
}

describe('the editor arranges the figure list and acts on several figures at once', () => {
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

  it('when the table opens, then it is in the chapter’s list order', async () => {
    expect((await tableRows(page)).slice(0, 3)).toEqual([
      '4.1 The 1s orbital',
      `4.2 ${RADIAL}`,
      `4.3 ${P_ORBITAL}`,
    ]);
  });

  it('when the editor focuses the 2p_z row and presses Alt+↑, then it moves above the radial plot and keeps focus', async () => {
    await page.getByRole('button', { name: 'Reorder and renumber' }).click();
    const row = page.getByRole('row', { name: `${P_ORBITAL}, position 3 of 8` });
    await row.getByLabel(`Number of ${P_ORBITAL}`).focus();
    await page.keyboard.press('Alt+ArrowUp');
    const moved = page.getByRole('row', { name: `${P_ORBITAL}, position 2 of 8` });
    await moved.waitFor();
    await page.getByRole('status').filter({ hasText: `${P_ORBITAL} moved to position 2 of 8.` }).waitFor();
    expect(await moved.evaluate((el) => el === document.activeElement)).toBe(true);
    // Once more, then back down with the button: the keyboard and the buttons agree.
    await page.keyboard.press('Alt+ArrowUp');
    await page.getByRole('row', { name: `${P_ORBITAL}, position 1 of 8` }).waitFor();
    await page.getByRole('button', { name: `Move ${P_ORBITAL} down` }).click();
    await page.getByRole('row', { name: `${P_ORBITAL}, position 2 of 8` }).waitFor();
    await page.getByRole('row', { name: `${RADIAL}, position 3 of 8` }).waitFor();
  });

  it('when the editor drags the last row onto the one above it, then they swap places', async () => {
    const last = page.getByRole('row', { name: 'The 4f_xyz orbital, position 8 of 8' });
    await last.dragTo(page.getByRole('row', { name: /^Energy levels and the Balmer series, position 7/ }));
    await page.getByRole('row', { name: 'The 4f_xyz orbital, position 7 of 8' }).waitFor();
    // And back, with the keyboard, so that the rest of the test keeps the chapter's order.
    await page.getByRole('row', { name: 'The 4f_xyz orbital, position 7 of 8' }).focus();
    await page.keyboard.press('Alt+ArrowDown');
    await page.getByRole('row', { name: 'The 4f_xyz orbital, position 8 of 8' }).waitFor();
  });

  it('when the editor numbers the list in sequence and edits one number, then the number cells show it', async () => {
    await page.getByLabel('Chapter prefix').fill('4');
    await page.getByRole('button', { name: 'Renumber 4.1, 4.2, …' }).click();
    expect(await page.getByLabel(`Number of ${P_ORBITAL}`).inputValue()).toBe('4.2');
    expect(await page.getByLabel(`Number of ${RADIAL}`).inputValue()).toBe('4.3');
    // Two figures may not share a number: the clash is named before anything is sent.
    await page.getByLabel(`Number of ${RADIAL}`).fill('4.2');
    await page.getByText('Used twice').first().waitFor();
    expect(await page.getByRole('button', { name: 'Save order' }).isDisabled()).toBe(true);
    await page.getByLabel(`Number of ${RADIAL}`).fill('4.2a');
    await saveScreenshot(page, 'review-figure-order-arranging');
    await page.getByRole('button', { name: 'Save order' }).click();
    await page.getByRole('status').filter({ hasText: 'Order and numbers saved.' }).waitFor();
  });

  it('when the page is reloaded, then the new order and numbers are kept', async () => {
    await page.reload();
    await page.getByRole('table', { name: /Figures in this project/ }).waitFor();
    await page.getByRole('rowheader', { name: P_ORBITAL }).waitFor();
    expect((await tableRows(page)).slice(0, 4)).toEqual([
      '4.1 The 1s orbital',
      `4.2 ${P_ORBITAL}`,
      `4.2a ${RADIAL}`,
      '4.4 The 3d_z² orbital',
    ]);
    await saveScreenshot(page, 'review-figure-order-saved');
    expect(problems).toEqual([]);
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
