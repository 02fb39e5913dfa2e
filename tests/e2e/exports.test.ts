// Browser end-to-end, with the job queue and its worker running: the owner exports the chapter's
// approved figures as PDF from the Exports tab, watches the run's progress bar reach the end, and
// downloads the bundle, a ZIP; "Export selected" on the figure table carries the ticked figures
// over; after a house-style change the figure table shows print files out of date until the
// server has rendered them again.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDemoData } from '../../db/demo-data';
import { createTestDatabase, withDb } from '../support/test-database';
import { startTestServer, type TestServer } from '../support/test-server';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';

describe('exports and print files', () => {
  let server: TestServer;
  let browser: Browser;
  let page: Page;
  let problems: string[];

  beforeAll(async () => {
    // As tests/support/stack.ts, plus the export queue, its worker and the mail fake.
    const url = await createTestDatabase(`lw_e2e_exports_${process.pid}`);
    await withDb(url, (db) => loadDemoData(db, 4));
    server = await startTestServer(
      url,
      { CLIENT_DIST: path.resolve('dist/app') },
      { jobs: true, mail: true },
    );
    browser = await launchChromium();
    page = await (await browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
    problems = watchForProblems(page);
    await signIn(page, server.baseUrl, 'ada.okafor@harrowgate.example');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('heading', { level: 1, name: PROJECT }).waitFor();
  });

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('when the owner opens the Exports tab, then no run is listed and approved figures are the default', async () => {
    await page.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Exports' }).click();
    await page.getByText('No exports yet. Start one above.').waitFor();
    expect(await page.getByRole('radio', { name: /^Approved figures only \(2\)$/ }).isChecked()).toBe(true);
  });

  it('when no format is ticked, then the form names the formats field and sends nothing', async () => {
    await page.getByRole('checkbox', { name: /^PDF/ }).uncheck();
    await page.getByRole('button', { name: 'Start export' }).click();
    await page.getByText('Choose at least one', { exact: true }).waitFor();
    expect(await page.getByText('No exports yet. Start one above.').count()).toBe(1);
  });

  it('when the owner starts an export of the approved figures as PDF, then its progress bar reaches 2 of 2', async () => {
    await page.getByRole('checkbox', { name: /^PDF/ }).check();
    await page.getByRole('button', { name: 'Start export' }).click();
    await page.getByRole('status').filter({ hasText: /^Export \d+ queued: 2 figures\./ }).waitFor();
    const run = page.getByRole('article', { name: /^Export \d+: Approved figures, PDF$/ });
    await run.waitFor();
    await saveScreenshot(page, 'exports-run-started');
    const bar = run.getByRole('progressbar');
    expect(await bar.getAttribute('aria-valuemax')).toBe('2');
    await run.getByText('Finished', { exact: true }).waitFor({ timeout: 90_000 });
    expect(await bar.getAttribute('aria-valuenow')).toBe('2');
    expect(await bar.getAttribute('aria-valuetext')).toBe('2 of 2 figures');
    await run.getByText('2 of 2 figures done').waitFor();
    await saveScreenshot(page, 'exports-run-finished');
  });

  it('when the owner downloads the bundle, then a ZIP arrives', async () => {
    const run = page.getByRole('article', { name: /^Export \d+: Approved figures, PDF$/ });
    const link = run.getByRole('link', { name: /^Download .+\.zip \(/ });
    const href = await link.getAttribute('href');
    expect(href).toMatch(/^\/api\/exports\/\d+\/bundle$/);
    const [download] = await Promise.all([page.waitForEvent('download'), link.click()]);
    const file = path.resolve('test-output/e2e/exports-bundle.zip');
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 4)).toEqual(Buffer.from('PK\x03\x04', 'latin1'));
    // The same address, asked with the page's session, answers as a ZIP.
    const response = await page.request.get(`${server.baseUrl}${href}`);
    expect(response.status()).toBe(200);
    expect(response.headers()['content-type']).toBe('application/zip');
  });

  it('when the owner ticks two figures in the table and chooses "Export selected", then the export form starts with those two', async () => {
    await page.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Figures' }).click();
    await page.getByRole('checkbox', { name: 'Select figure 4.5: Slice through the 3p_z orbital' }).check();
    await page.getByRole('checkbox', { name: 'Select figure 4.7: Energy levels and the Balmer series' }).check();
    const selected = page.getByRole('region', { name: 'Selected figures' });
    await selected.getByText('2 figures selected').waitFor();
    await selected.getByRole('button', { name: 'Export selected' }).click();
    await page.getByRole('heading', { name: 'New export' }).waitFor();
    expect(await page.getByRole('radio', { name: 'Chosen figures' }).isChecked()).toBe(true);
    const form = page.getByRole('form', { name: 'Start an export' });
    const ticked = form.getByRole('checkbox', { checked: true });
    expect(await ticked.count()).toBe(3); // the two figures and PDF
    await form.getByRole('checkbox', { name: /Slice through the 3p_z orbital/, checked: true }).waitFor();
    await form.getByRole('checkbox', { name: /Energy levels and the Balmer series/, checked: true }).waitFor();
  });

  it(
    'when the owner changes a project’s house style, then its figure table shows print files out of date and, as the server re-renders them, current',
    async () => {
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
      await page.getByRole('link', { name: 'CHEM 1020 — Fennwick College lectures' }).click();
      await page.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Settings' }).click();
      const form = page.getByRole('form', { name: 'House style' });
      await form.getByLabel('Resolution (dpi)').fill('150');
      await form.getByRole('button', { name: 'Save house style' }).click();
      await form.getByRole('status').waitFor();

      await page.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Figures' }).click();
      const table = page.getByRole('table', { name: /Figures in this project/ });
      await table.getByRole('rowheader').first().waitFor();
      // Nothing was rendered for the new style yet; the table asks again by itself until all are.
      expect(await table.getByText('Print files out of date', { exact: true }).count()).toBeGreaterThan(0);
      await table
        .getByText('Print files out of date', { exact: true })
        .first()
        .waitFor({ state: 'detached', timeout: 150_000 });
      expect(await table.getByText('Print files current', { exact: true }).count()).toBe(4);
      await saveScreenshot(page, 'exports-print-files-current');
      expect(problems).toEqual([]);
    },
    180_000,
  );
});
