// Browser end-to-end: an editor composes a figure. Opens figure 4.4 (3d_z²), turns it into 4f with
// the controls, sees the preview and read-out follow, undoes and redoes, saves a new revision, looks
// at what will print, draws a 2D radial plot, and downloads a PDF through the menu.
// Check values: E_4 = −13.6057/16 eV = −0.8504 eV for hydrogen with an infinite nucleus (Rydberg
// energy 13.605 693 eV, CODATA 2022; REFERENCE.md); nodes of 4f: n − l − 1 = 0 radial, l = 3 angular.
import { readFile } from 'node:fs/promises';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';

describe('the figure composer', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  let page: Page;
  let problems: string[];

  const ready3d = (text: RegExp) =>
    page
      .locator('[data-figure-ready="true"]')
      .filter({ hasText: text })
      .waitFor({ timeout: 60_000 });
  const readout = () => page.getByRole('region', { name: 'Read-out' });

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    page = await (
      await browser.newContext({ viewport: { width: 1360, height: 1000 }, acceptDownloads: true })
    ).newPage();
    problems = watchForProblems(page);
    await signIn(page, stack.baseUrl, 'ravi.mendes@harrowgate.example');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('link', { name: /^The 3d_z² orbital$|^The 3dz² orbital$/ }).click();
    await page.getByRole('heading', { level: 1, name: /Figure 4\.4/ }).waitFor();
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  it('when the figure opens, then the composer shows the 3d_z² isosurface and its read-out', async () => {
    await ready3d(/3D figure ready: 3d_z²/);
    expect(await page.getByLabel('n (shell)').inputValue()).toBe('3');
    expect(await page.getByLabel('l (subshell)').inputValue()).toBe('2');
    const orbitalOptions = await page
      .getByRole('combobox', { name: 'Orbital', exact: true })
      .locator('option')
      .allTextContents();
    expect(orbitalOptions).toHaveLength(5);
    expect(orbitalOptions[0]).toMatch(/^3dz² \(m = 0\)$/);
    await readout().getByRole('rowheader', { name: '3dz²' }).waitFor();
    await page.getByText('Revision 1, no unsaved changes').waitFor();
    await saveScreenshot(page, 'composer-3dz2');
  });

  it('when the state is changed to 4f with the controls, then the preview and read-out follow', async () => {
    await page.getByLabel('n (shell)').selectOption('4');
    await page.getByLabel('l (subshell)').selectOption('3');
    // m stays 0: the orbital is 4f_z³, and the list offers the seven f orbitals by name.
    expect(
      await page.getByRole('combobox', { name: 'Orbital', exact: true }).locator('option').count(),
    ).toBe(7);
    await ready3d(/3D figure ready: 4f_z³/);
    const row = readout().getByRole('row', { name: /4fz³/ });
    await row.waitFor();
    const cells = await row.getByRole('cell').allTextContents();
    expect(cells[0]).toMatch(/^-0\.8504 eV/);
    expect(cells[1]).toBe('0 / 3');
    await page.getByText('Unsaved changes', { exact: true }).waitFor();
    await saveScreenshot(page, 'composer-4f');
  });

  it('when the editor undoes with Ctrl+Z, then the state steps back; Shift+Ctrl+Z brings it forward', async () => {
    await page.getByLabel('l (subshell)').focus();
    await page.keyboard.press('Control+Z');
    await readout().getByRole('row', { name: /4dz²/ }).waitFor();
    await page.getByRole('button', { name: 'Undo' }).click();
    await readout().getByRole('row', { name: /3dz²/ }).waitFor();
    await page.getByText('Revision 1, no unsaved changes').waitFor();
    expect(await page.getByRole('button', { name: 'Undo' }).isDisabled()).toBe(true);
    await page.keyboard.press('Control+Shift+Z');
    await page.getByRole('button', { name: 'Redo' }).click();
    await ready3d(/3D figure ready: 4f_z³/);
    expect(await page.getByLabel('l (subshell)').inputValue()).toBe('3');
  });

  it('when the editor saves, then the figure becomes revision 2 with the 4f state', async () => {
    await page.getByLabel('Revision note').fill('4f instead of 3d');
    await page.getByRole('button', { name: 'Save figure as revision 2' }).click();
    await page.getByRole('status').filter({ hasText: 'Figure saved as revision 2.' }).waitFor();
    await page.getByText('Revision 2, no unsaved changes').waitFor();
    await page
      .getByRole('region', { name: 'Revisions' })
      .getByRole('cell', { name: '4f instead of 3d' })
      .waitFor();
  });

  it('when the editor asks what will print, then the saved PNG is shown at its size with its pixels and dpi', async () => {
    await page.getByRole('button', { name: 'Show what will print' }).click();
    const image = page.getByRole('img', { name: 'Revision 2 as it will print' });
    await image.waitFor({ timeout: 90_000 });
    await page
      .getByText(/Revision 2: 84 × 84 mm at 300 dpi, 992 × 992 px\./)
      .waitFor({ timeout: 30_000 });
    await image.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'composer-what-will-print');
  });

  it('when a PDF is chosen from the download menu, then the server sends a PDF of revision 2', async () => {
    await page.getByRole('button', { name: 'Download' }).click();
    const menu = page.getByRole('menu', { name: 'Download revision 2' });
    await menu.waitFor();
    await saveScreenshot(page, 'composer-download-menu');
    const responseWait = page.waitForResponse(
      (r) => r.url().includes('/render?format=pdf&revision=2'),
      { timeout: 90_000 },
    );
    const downloadWait = page.waitForEvent('download', { timeout: 90_000 });
    await menu.getByRole('menuitem', { name: /^PDF/ }).click();
    const response = await responseWait;
    expect(response.status()).toBe(200);
    expect(response.headers()['content-type']).toMatch(/^application\/pdf/);
    const download = await downloadWait;
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    const saved = await readFile((await download.path())!);
    expect(saved.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    await page
      .getByRole('status')
      .filter({ hasText: /^Downloaded .*\.pdf\./ })
      .waitFor();
  });

  it('when the kind becomes a radial plot, then the 2D figure is drawn in the browser with its values', async () => {
    await page.getByRole('tab', { name: 'Figure' }).click();
    await page.getByLabel('Kind of figure').selectOption('radial');
    await page
      .locator('[data-figure-ready="true"]')
      .filter({ hasText: /Figure ready/ })
      .waitFor({ timeout: 30_000 });
    await page.getByRole('region', { name: 'Preview' }).locator('svg').first().waitFor();
    await readout()
      .getByRole('group', { name: 'Values printed in the figure' })
      .or(readout().locator('dl'))
      .first()
      .waitFor();
    await saveScreenshot(page, 'composer-radial');
    const print = page.getByRole('region', { name: 'What will print' });
    await print
      .getByText(
        /^Your unsaved changes, drawn in the browser at the printed size: 84 × 84 mm; at 300 dpi the PNG will be 992 × 992 px\./,
      )
      .waitFor();
    await print.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'composer-radial-print');
    await page.keyboard.press('Control+Z');
    await ready3d(/3D figure ready: 4f_z³/);
    expect(problems).toEqual([]);
  });

  it('when the figure sets its own colour, then it is listed against the house style and "apply house style" clears it', async () => {
    await page.getByRole('tab', { name: 'Look' }).click();
    await page.getByRole('button', { name: 'Set positive phase colour for this figure' }).click();
    const houseStyle = page.getByRole('region', { name: 'House style' });
    await houseStyle.getByRole('rowheader', { name: 'Positive phase colour' }).waitFor();
    await page
      .getByRole('button', { name: 'Use the house style for positive phase colour' })
      .waitFor();
    await saveScreenshot(page, 'composer-look-override');
    await houseStyle.getByRole('button', { name: 'Apply house style (clear these)' }).click();
    await houseStyle
      .getByText('Every look and print setting comes from the project’s house style.')
      .waitFor();
    await page.getByText('Revision 2, no unsaved changes').waitFor();
  });

  it('when the slice preset is applied, then the slice is drawn with its colour scale; undo returns to 4f', async () => {
    await page
      .getByLabel('Start from a preset')
      .selectOption({ label: '3p_z slice (xz-plane) with contours' });
    await page.getByRole('button', { name: 'Apply', exact: true }).click();
    await page
      .locator('[data-figure-ready="true"]')
      .filter({ hasText: /Figure ready: .*3p/ })
      .waitFor({ timeout: 30_000 });
    await saveScreenshot(page, 'composer-slice');
    await page.getByRole('button', { name: 'Undo' }).click();
    await ready3d(/3D figure ready: 4f_z³/);
  });

  it.each([
    ['Balmer series levels (Hα to Hδ)', /Figure ready: Energy levels/, 'composer-levels'],
    ['Angular shape of d_z² (curve in the xz-plane)', /Figure ready: /, 'composer-angular-curve'],
  ])(
    'when the preset "%s" is applied, then its 2D figure is drawn; undo returns to 4f',
    async (name, ready, shot) => {
      await page.getByLabel('Start from a preset').selectOption({ label: name });
      await page.getByRole('button', { name: 'Apply', exact: true }).click();
      await page
        .locator('[data-figure-ready="true"]')
        .filter({ hasText: ready })
        .waitFor({ timeout: 30_000 });
      await saveScreenshot(page, shot);
      await page.getByRole('button', { name: 'Undo' }).click();
      await ready3d(/3D figure ready: 4f_z³/);
    },
  );

  it('when the control tabs are used from the keyboard, then arrow keys move between them with a visible focus', async () => {
    await page.getByRole('tab', { name: 'Orbital' }).click();
    await page.keyboard.press('ArrowRight');
    const figureTab = page.getByRole('tab', { name: 'Figure' });
    expect(await figureTab.getAttribute('aria-selected')).toBe('true');
    expect(await figureTab.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.keyboard.press('Tab');
    await page.keyboard.press('Tab');
    expect(
      await page.getByLabel('Kind of figure').evaluate((el) => el === document.activeElement),
    ).toBe(true);
    await page.getByRole('tab', { name: 'Orbital' }).click();
  });

  it('when the state becomes a superposition, then each term has its weights and the read-out gives shares', async () => {
    await page.getByRole('tab', { name: 'Orbital' }).click();
    await page.getByText('Superposition', { exact: true }).click();
    await page.getByRole('list', { name: 'Terms of the superposition' }).waitFor();
    await page.getByLabel('Term 2 Weight, imaginary').fill('1');
    await readout()
      .getByText(/Mean energy/)
      .waitFor();
    await ready3d(/3D figure ready: superposition of 2 terms/);
    await saveScreenshot(page, 'composer-superposition');
    await page.getByText('One orbital', { exact: true }).click();
    await ready3d(/3D figure ready: 4f_z³/);
  });

  it('when someone saved meanwhile, then saving names their revision and "save mine on top" keeps both', async () => {
    const ada = await (
      await browser.newContext({ viewport: { width: 1360, height: 1000 } })
    ).newPage();
    await signIn(ada, stack.baseUrl, 'ada.okafor@harrowgate.example');
    await ada.getByRole('link', { name: PROJECT }).click();
    await ada.getByRole('link', { name: /^The 3d_z² orbital$|^The 3dz² orbital$/ }).click();
    await ada.getByLabel('Caption').fill('The 4f_z³ orbital with its three nodal surfaces.');
    await ada.getByRole('button', { name: 'Save as new revision' }).click();
    await ada
      .getByRole('status')
      .filter({ hasText: /^Saved as revision 3\.$/ })
      .waitFor();

    await page.getByRole('tab', { name: 'Figure' }).click();
    await page.getByLabel('Probability enclosed').fill('80');
    await page.getByText('Unsaved changes', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Save figure as revision 3' }).click();
    const notice = page
      .getByRole('alert')
      .filter({ hasText: 'saved revision 3 while you were editing' });
    await notice.waitFor();
    expect(await notice.textContent()).toContain(
      'Ada Okafor saved revision 3 while you were editing.',
    );
    await saveScreenshot(page, 'composer-newer-revision');
    await notice.getByRole('button', { name: 'Save mine on top of revision 3' }).click();
    await page.getByRole('status').filter({ hasText: 'Figure saved as revision 4.' }).waitFor();
    expect(await page.getByLabel('Caption').inputValue()).toBe(
      'The 4f_z³ orbital with its three nodal surfaces.',
    );
    expect(await page.getByLabel('Probability enclosed').inputValue()).toBe('80');
  });

  it('when a viewer opens the figure, then the composer is read-only but downloads remain', async () => {
    const viewer = await (
      await browser.newContext({ viewport: { width: 1360, height: 1000 } })
    ).newPage();
    const viewerProblems = watchForProblems(viewer);
    await signIn(viewer, stack.baseUrl, 'tomas.reyes@fennwick.example');
    await viewer.getByRole('link', { name: PROJECT }).click();
    await viewer.getByRole('link', { name: /^The 3d_z² orbital$|^The 3dz² orbital$/ }).click();
    await viewer
      .getByText('Read-only: you can look at this figure and download it, but not change it.')
      .waitFor();
    await viewer
      .locator('[data-figure-ready="true"]')
      .filter({ hasText: /4f_z³/ })
      .waitFor({ timeout: 60_000 });
    expect(await viewer.getByLabel('n (shell)').isDisabled()).toBe(true);
    expect(await viewer.getByRole('button', { name: /^(Undo|Redo|Save figure)/ }).count()).toBe(0);
    await viewer.getByRole('button', { name: 'Download' }).waitFor();
    await saveScreenshot(viewer, 'composer-viewer');
    await viewer.setViewportSize({ width: 760, height: 1000 });
    await saveScreenshot(viewer, 'composer-viewer-narrow');
    expect(viewerProblems).toEqual([]);
  });
});
