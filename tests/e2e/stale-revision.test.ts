// Browser end-to-end: two editors change the same figure at once. The one who saves second is told
// who saved which revision meanwhile, and can save on top of it or load it; nothing is lost silently.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';
const FIGURE = 'The 1s orbital';

async function openFigure(page: Page, baseUrl: string, email: string): Promise<void> {
  await signIn(page, baseUrl, email);
  await page.getByRole('link', { name: PROJECT }).click();
  await page.getByRole('link', { name: FIGURE, exact: true }).click();
  await page.getByRole('heading', { level: 1, name: new RegExp(FIGURE) }).waitFor();
}

describe('two editors saving the same figure', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  let ada: Page;
  let ravi: Page;
  let problems: string[];

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    ada = await (await browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
    ravi = await (await browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
    problems = [...watchForProblems(ada), ...watchForProblems(ravi)];
    await openFigure(ada, stack.baseUrl, 'ada.okafor@harrowgate.example');
    await openFigure(ravi, stack.baseUrl, 'ravi.mendes@harrowgate.example');
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  it('when the editor saves a new caption, then it becomes the next revision', async () => {
    await ravi.getByLabel('Caption').fill('The 1s orbital: one spherical lobe, no nodes.');
    await ravi.getByLabel('Note for this revision').fill('shorter caption');
    await ravi.getByRole('button', { name: 'Save as new revision' }).click();
    await ravi
      .getByRole('status')
      .filter({ hasText: /^Saved as revision 2\.$/ })
      .waitFor();
  });

  it('when the owner saves over the older revision, then the page names the newer one and who saved it', async () => {
    await ada.getByLabel('Alt text').fill('A sphere centred on the nucleus.');
    await ada.getByRole('button', { name: 'Save as new revision' }).click();
    const notice = ada.getByRole('alert').filter({ hasText: 'saved revision 2 meanwhile' });
    await notice.waitFor();
    expect(await notice.textContent()).toContain('Ravi Mendes saved revision 2 meanwhile.');
    expect(await ada.getByLabel('Alt text').inputValue()).toBe('A sphere centred on the nucleus.');
    await saveScreenshot(ada, 'stale-revision-notice');
  });

  it('when the owner saves on top, then revision 3 keeps both changes', async () => {
    await ada.getByRole('button', { name: 'Save mine on top of revision 2' }).click();
    await ada
      .getByRole('status')
      .filter({ hasText: /^Saved as revision 3\.$/ })
      .waitFor();
    expect(await ada.getByLabel('Caption').inputValue()).toBe(
      'The 1s orbital: one spherical lobe, no nodes.',
    );
    expect(await ada.getByLabel('Alt text').inputValue()).toBe('A sphere centred on the nucleus.');
    const revisions = ada.getByRole('region', { name: 'Revisions' });
    await revisions.getByRole('rowheader', { name: /^3\s*latest/ }).waitFor();
    await revisions.getByRole('cell', { name: 'shorter caption' }).waitFor();
  });

  it('when the editor, now behind, chooses to load the newer revision, then their unsaved edit is dropped', async () => {
    await ravi.getByLabel('Title').fill('The 1s orbital (draft title)');
    await ravi.getByRole('button', { name: 'Save as new revision' }).click();
    await ravi
      .getByRole('alert')
      .filter({ hasText: 'Ada Okafor saved revision 3 meanwhile.' })
      .waitFor();
    await ravi.getByRole('button', { name: 'Load revision 3 (drop my changes)' }).click();
    expect(await ravi.getByLabel('Title').inputValue()).toBe(FIGURE);
    expect(await ravi.getByLabel('Alt text').inputValue()).toBe('A sphere centred on the nucleus.');
    await ravi.getByText('Editing on top of revision 3').waitFor();
    expect(problems).toEqual([]);
  });

  it('when the editor opens revision 1, then it names what differs and restoring it makes revision 4', async () => {
    const revisions = ravi.getByRole('region', { name: 'Revisions' });
    await revisions.getByRole('button', { name: 'Show revision 1' }).click();
    await revisions
      .getByText('Differs from the latest revision (3) in: caption, alt text.')
      .waitFor();
    // Side by side: both revisions as they print, and the two changed settings marked.
    const sideBySide = revisions.getByRole('region', { name: 'Revision 1 beside revision 3' });
    await sideBySide.getByText('2 settings differ; marked below.').waitFor();
    await sideBySide.getByRole('rowheader', { name: /^caption changed$/ }).waitFor();
    await sideBySide.getByRole('rowheader', { name: /^altText changed$/ }).waitFor();
    expect(await sideBySide.getByRole('rowheader', { name: /^title$/ }).count()).toBe(1);
    await sideBySide.getByRole('img', { name: 'Revision 1 as it prints' }).waitFor();
    await saveScreenshot(ravi, 'revision-side-by-side');
    await revisions.getByRole('button', { name: 'Restore revision 1' }).click();
    await revisions.getByText('Revision 1 restored as revision 4.').waitFor();
    expect(await ravi.getByLabel('Caption').inputValue()).toBe(
      'Surface enclosing 90 % of the probability of the hydrogen 1s orbital.',
    );
    expect(await ravi.getByLabel('Alt text').inputValue()).toBe('');
    await revisions.getByRole('cell', { name: 'Restored revision 1' }).waitFor();
    await saveScreenshot(ravi, 'revision-restored');
    expect(problems).toEqual([]);
  });

  it('when the editor turns the 3D view with the keyboard and keeps it, then the view is saved as revision 5', async () => {
    const view = ravi.getByRole('group', { name: /3D figure/ });
    await view.focus();
    await ravi.keyboard.press('ArrowRight');
    const bar = ravi.getByText(/^Shown turned to azimuth 50°, elevation 20°, zoom 1;/);
    await bar.waitFor();
    await ravi.getByRole('button', { name: 'Keep this view as a new revision' }).click();
    await bar.waitFor({ state: 'detached' });
    const summary = ravi.getByRole('region', { name: 'What the figure shows' });
    await summary.getByText('Azimuth 50°, elevation 20°, orthographic, zoom 1').waitFor();
    await ravi
      .getByRole('region', { name: 'Revisions' })
      .getByRole('cell', { name: 'View: azimuth 50°, elevation 20°, zoom 1' })
      .waitFor();
    expect(problems).toEqual([]);
  });
});
