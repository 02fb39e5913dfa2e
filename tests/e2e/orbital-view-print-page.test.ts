// The print page's own contract, as any driver sees it: a job set before load draws a canvas of
// exactly the asked size and sets data-figure-ready; a bad job sets data-figure-error naming the
// field. Needs the built client (dist/app).
import { createReadStream, existsSync, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchChromium } from './support/chromium';

const DIST = path.resolve('dist/app');
const job = (spec: unknown, widthPx = 300, heightPx = 200) => ({ spec, widthPx, heightPx });
const pz = {
  schemaVersion: 1,
  state: { terms: [{ n: 2, l: 1, m: 0 }] },
  kind: { type: 'isosurface', grid: 48 },
};

describe('print-3d.html', () => {
  let server: Server;
  let base: string;
  let browser: Browser;

  beforeAll(async () => {
    server = createServer((request, response) => {
      const file = path.join(DIST, new URL(request.url ?? '/', 'http://x').pathname);
      if (!file.startsWith(DIST) || !existsSync(file) || !statSync(file).isFile())
        return void response.writeHead(404).end();
      response.writeHead(200, {
        'content-type': file.endsWith('.js') ? 'text/javascript' : 'text/html',
      });
      createReadStream(file).pipe(response);
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    browser = await launchChromium();
  });

  afterAll(async () => {
    await browser?.close();
    server?.close();
  });

  async function open(printJob: unknown) {
    const page = await browser.newPage({ viewport: { width: 400, height: 300 } });
    await page.addInitScript((j) => {
      (window as unknown as { __LOBEWRIGHT_PRINT__: unknown }).__LOBEWRIGHT_PRINT__ = j;
    }, printJob);
    await page.goto(`${base}/print-3d.html`);
    await page.waitForFunction(
      () =>
        document.documentElement.dataset.figureReady === 'true' ||
        document.documentElement.dataset.figureError !== undefined,
    );
    return page;
  }

  it('when a job is set before load, then the canvas has the exact size and the page says it is ready', async () => {
    const page = await open(job(pz));
    const state = await page.evaluate(() => ({
      ready: document.documentElement.dataset.figureReady,
      error: document.documentElement.dataset.figureError ?? null,
      canvas: [document.querySelector('canvas')!.width, document.querySelector('canvas')!.height],
      label: window.__LOBEWRIGHT_PRINT_RESULT__?.facts.label,
    }));
    expect(state).toEqual({ ready: 'true', error: null, canvas: [300, 200], label: '2p_z' });
    await page.close();
  });

  it('when the job is bad, then data-figure-error names the field', async () => {
    const badSpec = await open(job({ ...pz, kind: { type: 'isosurface', enclosed: 2 } }));
    expect(await badSpec.evaluate(() => document.documentElement.dataset.figureError)).toMatch(
      /^spec\.kind\.enclosed: /,
    );
    await badSpec.close();
    const badSize = await open(job(pz, 0, 200));
    expect(await badSize.evaluate(() => document.documentElement.dataset.figureError)).toMatch(
      /^widthPx: must be an integer/,
    );
    await badSize.close();
    const slice = await open(job({ ...pz, kind: { type: 'slice' } }));
    expect(await slice.evaluate(() => document.documentElement.dataset.figureError)).toMatch(
      /^kind\.type: "slice" is a 2D figure/,
    );
    await slice.close();
  });
});
