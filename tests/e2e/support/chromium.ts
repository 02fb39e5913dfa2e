// Debian's Chromium, headless, driven by playwright-core, with the switches that keep it quiet and
// offline apart from the page under test.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { CHROMIUM_ARGS } from '../../../api/render/render-3d';

export const CHROMIUM_PATH = process.env.LOBEWRIGHT_CHROMIUM ?? '/usr/bin/chromium';

export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
  });
}

/** Screenshots go to test-output/e2e (ignored by git). */
export async function saveScreenshot(page: Page, name: string): Promise<string> {
  const dir = path.resolve('test-output/e2e');
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/** Collects uncaught page errors and failed API answers, so a test can say none happened. */
export function watchForProblems(page: Page): string[] {
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('response', (response) => {
    if (response.status() >= 500)
      problems.push(`${response.status()} from ${response.request().method()} ${response.url()}`);
  });
  return problems;
}
