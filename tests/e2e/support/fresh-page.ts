// A page in a browser context of its own (its own cookies, so its own session), watched for page
// errors and server failures, which are added to `problems`.
import type { Browser, Page } from 'playwright-core';

export async function freshPage(browser: Browser, problems: string[]): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 1000 } });
  const page = await context.newPage();
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('response', (response) => {
    if (response.status() >= 500)
      problems.push(`${response.status()} from ${response.request().method()} ${response.url()}`);
  });
  return page;
}
