// Browser end-to-end: an editor uploads radial data (problems shown with line numbers before
// sending, units chosen when the header has none), then carries a project to a new one with a
// bundle and imports it again into that project (identical figures skipped).
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';

describe('radial data uploads and bundles in the browser', () => {
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
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  const csv = (name: string, text: string) => ({
    name,
    mimeType: 'text/csv',
    buffer: Buffer.from(text),
  });

  it('when an editor chooses a CSV with bad rows, then each problem shows with its line and nothing can be sent; a good one is stored and listed', async () => {
    await page.getByRole('link', { name: PROJECT }).click();
    await page
      .getByRole('navigation', { name: 'Project' })
      .getByRole('link', { name: 'Data' })
      .click();
    await page.getByText('No data uploaded yet.').waitFor();

    const file = page.getByLabel('CSV file');
    await file.setInputFiles(csv('bad.csv', 'r_bohr,R_bohr^-3/2\n0,2\n1,NaN\n0.5,1\n'));
    const alert = page.getByRole('alert');
    await alert.getByText('Line 3: R "NaN" is not a finite decimal number').waitFor();
    await alert.getByText('Line 4: r must increase from row to row, but 0.5 follows 1').waitFor();
    expect(await page.getByRole('button', { name: 'Upload data' }).isDisabled()).toBe(true);
    await saveScreenshot(page, 'data-upload-problems');

    await file.setInputFiles(
      csv(
        'hf-1s.csv',
        'r,R\n0,2\n0.5,1.2130613194252668\n1,0.7357588823428847\n2,0.2706705664732254\n',
      ),
    );
    await page.getByText(/the header gives no unit for r/).waitFor();
    await page.getByLabel('Unit of r').selectOption('bohr');
    await page.getByLabel('Unit of the values').selectOption('bohr^-3/2');
    await page.getByText(/4 points of R \(radial function\), r in bohr/).waitFor();
    expect(await page.getByLabel('Name').inputValue()).toBe('hf-1s');
    await page.getByRole('button', { name: 'Upload data' }).click();
    await page.getByText('Stored “hf-1s”: 4 points.').waitFor();
    const row = page.getByRole('row', { name: /hf-1s/ });
    await row.waitFor();
    expect(await row.getByRole('cell').nth(2).textContent()).toBe('bohr, bohr^-3/2');

    const links = page.getByRole('region', { name: 'Figures drawing data' });
    await links.getByText('No figure draws uploaded data yet.').waitFor();
    await links.getByLabel('Data set').selectOption({ label: 'hf-1s' });
    await links
      .getByLabel('Radial figure')
      .selectOption({ label: 'Figure 4.2: Radial distributions of 1s, 2s and 3s' });
    await links.getByLabel('Legend label (optional)').fill('HF 1s');
    await links.getByRole('button', { name: 'Draw in figure' }).click();
    await links
      .getByText(/^Figure 4\.2: Radial distributions of 1s, 2s and 3s: saved as revision \d+\.$/)
      .waitFor();
    await links.getByText('(shown as “HF 1s”)').waitFor();
    const figureHref = await links.getByRole('link', { name: /Figure 4\.2/ }).getAttribute('href');
    const svg = await page.request.get(`${stack.baseUrl}/api${figureHref}/render?format=svg`);
    expect(await svg.text()).toContain('>HF 1s</tspan>');
    await saveScreenshot(page, 'data-uploaded');
  });

  it('when a project bundle is imported as a new project and then into it again, then the report says what was imported and skipped', async () => {
    const projectUrl = page.url().replace(/\/data$/, '');
    const href = await page
      .goto(projectUrl)
      .then(() => page.getByRole('link', { name: 'Download bundle' }).first().getAttribute('href'));
    expect(href).toMatch(/^\/api\/projects\/\d+\/bundle$/);
    const bundle = await page.request.get(stack.baseUrl + href);
    expect(bundle.status()).toBe(200);
    const bytes = await bundle.body();

    await page.getByRole('link', { name: 'Projects', exact: true }).first().click();
    await page.getByRole('button', { name: 'Import bundle' }).click();
    const dialog = page.getByRole('dialog', { name: 'New project from a bundle' });
    await dialog.getByLabel(/Bundle file/).setInputFiles({
      name: 'chapter-4.lobewright.json',
      mimeType: 'application/json',
      buffer: bytes,
    });
    await dialog.getByRole('button', { name: 'Import' }).click();
    await dialog.getByText(/^Imported \d+ figures and 1 data set\.$/).waitFor();
    await saveScreenshot(page, 'bundle-imported');
    await dialog.getByRole('link', { name: 'Open the new project' }).click();
    await page.getByRole('table', { name: /Figures in this project/ }).waitFor();

    await page.getByText('Import figures from a bundle').click();
    await page.getByLabel(/Bundle file/).setInputFiles({
      name: 'again.lobewright.json',
      mimeType: 'application/json',
      buffer: bytes,
    });
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    await page.getByText(/^Imported 0 figures\.$/).waitFor();
    await page.getByText('Skipped:').waitFor();

    await page.getByRole('link', { name: 'The 1s orbital', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: /The 1s orbital/ }).waitFor();
    expect(await page.getByRole('link', { name: 'Download bundle' }).getAttribute('href')).toMatch(
      /^\/api\/figures\/\d+\/bundle$/,
    );

    await page.getByRole('link', { name: 'Copy to another project' }).click();
    await page.getByLabel('Into project').selectOption({ label: PROJECT });
    await page.getByRole('button', { name: 'Copy figure' }).click();
    await page.getByRole('heading', { level: 1, name: /Figure 4\.1-2\s*The 1s orbital/ }).waitFor();
    await saveScreenshot(page, 'figure-copied');
    expect(problems).toEqual([]);
  });
});
