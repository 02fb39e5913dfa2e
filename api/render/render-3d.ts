/**
 * Print rendering of 3D figures: the browser viewer's own scene code (app/print-3d.tsx, built into
 * dist/app) drawn in headless Chromium from Debian's packages, through playwright-core, at exactly
 * round(mm / 25.4 × dpi) pixels per side, to PNG (transparent or white background).
 *
 * One browser is launched on first use and kept warm for the next figures (about 1 s saved per
 * figure); it is closed when the process exits or by closeRender3d(). dist/app is served by a small
 * static HTTP server on 127.0.0.1 (an ephemeral port), because module scripts do not load from
 * file://. Chromium runs with --disable-gpu: WebGL 2 comes from SwiftShader, with MSAA.
 */
import { createReadStream, existsSync, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { AppError } from '../lib/app-error';
import type { ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import type { OrbitalFacts } from '../../app/features/orbital-view/utils/orbital-geometry';
import type { PrintProjection } from '../../app/features/orbital-view/utils/print-projection';
import type { PrintJob } from '../../app/print-3d';

/** Debian's Chromium; LOBEWRIGHT_CHROMIUM points elsewhere (the same switch as the browser tests). */
export const CHROMIUM_PATH = process.env.LOBEWRIGHT_CHROMIUM ?? '/usr/bin/chromium';
/** Headless Chromium switches: no GPU (SwiftShader WebGL), and no network beyond the page under test. */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];
/** Largest side of a 3D raster (SwiftShader's limit is 8192; 6000 px is a 254 mm slide at 600 dpi). */
export const MAX_3D_SIDE_PX = 6000;
/** Largest raster in pixels (with 4× MSAA about 1 GB of render buffers at this size). */
export const MAX_3D_PIXELS = 25_000_000;
export const DEFAULT_TIMEOUT_MS = 60_000;
const DEFAULT_DIST = fileURLToPath(new URL('../../dist/app', import.meta.url));
const THREE_D_KINDS = new Set(['isosurface', 'cloud', 'angular']);

export interface Render3dOptions {
  /** Overrides spec.print.background. */
  background?: 'transparent' | 'white';
  /** Fails cleanly after this many milliseconds (default 60 s). */
  timeoutMs?: number;
  /** The built client (default dist/app). */
  distDir?: string;
}

export interface Render3dResult {
  png: Buffer;
  widthPx: number;
  heightPx: number;
  facts: OrbitalFacts;
  notes: readonly string[];
  /** Pixel positions of the nucleus, axis ends and scale bar, for the vector labels. */
  projection: PrintProjection;
  /**
   * Milliseconds: browser start (0 when warm), print page load (0 when warm), geometry and drawing
   * in the page (draw, of which geometry), PNG capture, total.
   */
  ms: {
    launch: number;
    page: number;
    draw: number;
    geometry: number;
    capture: number;
    total: number;
  };
}

/** Pixels along one side: round(mm / 25.4 × dpi). */
export function printPixels(mm: number, dpi: number): number {
  return Math.round((mm / 25.4) * dpi);
}

function checkSize(spec: ResolvedFigureSpec): { widthPx: number; heightPx: number } {
  const widthPx = printPixels(spec.print.widthMm, spec.print.dpi);
  const heightPx = printPixels(spec.print.heightMm, spec.print.dpi);
  const fields: Record<string, string> = {};
  for (const [field, px, mm] of [
    ['print.widthMm', widthPx, spec.print.widthMm],
    ['print.heightMm', heightPx, spec.print.heightMm],
  ] as const) {
    if (px > MAX_3D_SIDE_PX)
      fields[field] =
        `${mm} mm at ${spec.print.dpi} dpi is ${px} px; 3D figures are limited to ${MAX_3D_SIDE_PX} px per side`;
    if (px < 1) fields[field] = `${mm} mm at ${spec.print.dpi} dpi is less than one pixel`;
  }
  if (Object.keys(fields).length === 0 && widthPx * heightPx > MAX_3D_PIXELS) {
    fields['print.dpi'] =
      `${widthPx} × ${heightPx} px exceeds the 3D limit of ${MAX_3D_PIXELS / 1e6} million pixels; lower the dpi or the size`;
  }
  if (Object.keys(fields).length > 0) {
    throw new AppError(
      422,
      'figure_too_large',
      `the 3D figure is too large to render: ${Object.values(fields).join('; ')}`,
      fields,
    );
  }
  return { widthPx, heightPx };
}

// ---- static server for dist/app -------------------------------------------------------------

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json',
  '.map': 'application/json',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.otf': 'font/otf',
  '.woff2': 'font/woff2',
};

function startStaticServer(root: string): Promise<{ server: Server; base: string }> {
  const server = createServer((request, response) => {
    const url = new URL(request.url ?? '/', 'http://127.0.0.1');
    const file = path.resolve(root, `.${decodeURIComponent(url.pathname)}`);
    if (!file.startsWith(root + path.sep) || !existsSync(file) || !statSync(file).isFile()) {
      response.writeHead(404).end();
      return;
    }
    response.writeHead(200, {
      'content-type': CONTENT_TYPES[path.extname(file)] ?? 'application/octet-stream',
    });
    createReadStream(file).pipe(response);
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      server.unref();
      resolve({ server, base: `http://127.0.0.1:${port}` });
    });
  });
}

// ---- the warm browser and page -------------------------------------------------------------

interface Warm {
  browser: Browser;
  server: Server;
  base: string;
  root: string;
  /** The print page, loaded once and handed one job after another (null until first use or after a failure). */
  page: Page | null;
  /** Jobs run one at a time on the page. */
  queue: Promise<unknown>;
}

let warm: Promise<Warm> | null = null;

async function launch(root: string): Promise<Warm> {
  if (!existsSync(path.join(root, 'print-3d.html'))) {
    throw new AppError(
      500,
      'client_not_built',
      `${root}/print-3d.html is missing: build the client first (npx vite build)`,
    );
  }
  if (!existsSync(CHROMIUM_PATH))
    throw new AppError(
      500,
      'no_browser',
      `${CHROMIUM_PATH} is missing: install Debian's chromium package`,
    );
  const { server, base } = await startStaticServer(root);
  try {
    const browser = await chromium.launch({
      executablePath: CHROMIUM_PATH,
      headless: true,
      args: CHROMIUM_ARGS,
    });
    browser.on('disconnected', () => {
      server.close();
      warm = null;
    });
    return { browser, server, base, root, page: null, queue: Promise.resolve() };
  } catch (error) {
    server.close();
    throw new AppError(
      500,
      'browser_failed',
      `Chromium did not start: ${(error as Error).message}`,
      undefined,
      { cause: error },
    );
  }
}

async function warmBrowser(root: string): Promise<{ warm: Warm; launchMs: number }> {
  const started = performance.now();
  if (warm) {
    const current = await warm;
    if (current.root === root && current.browser.isConnected())
      return { warm: current, launchMs: 0 };
    await closeRender3d();
  }
  warm = launch(root);
  warm.catch(() => {
    warm = null;
  });
  return { warm: await warm, launchMs: performance.now() - started };
}

/** Closes the warm browser and the static server (also done at process exit). */
export async function closeRender3d(): Promise<void> {
  const current = warm;
  warm = null;
  if (!current) return;
  const w = await current.catch(() => null);
  if (!w) return;
  w.server.close();
  await w.browser.close().catch(() => undefined);
}

process.once('beforeExit', () => void closeRender3d());

async function printPage(
  w: Warm,
  widthPx: number,
  heightPx: number,
  timeoutMs: number,
  pageErrors: string[],
): Promise<Page> {
  if (w.page && !w.page.isClosed()) {
    await w.page.setViewportSize({ width: widthPx, height: heightPx });
    return w.page;
  }
  const context = await w.browser.newContext({
    viewport: { width: widthPx, height: heightPx },
    deviceScaleFactor: 1,
  });
  const page = await context.newPage();
  page.on('pageerror', (error) => pageErrors.push(error.message));
  await page.goto(`${w.base}/print-3d.html`, { waitUntil: 'load', timeout: timeoutMs });
  await page.waitForFunction(() => typeof window.__lobewrightPrint === 'function', null, {
    timeout: timeoutMs,
    polling: 10,
  });
  w.page = page;
  return page;
}

async function discardPage(w: Warm): Promise<void> {
  const page = w.page;
  w.page = null;
  await page
    ?.context()
    .close()
    .catch(() => undefined);
}

// ---- one figure -----------------------------------------------------------------------------

export async function render3dPng(
  spec: ResolvedFigureSpec,
  opts: Render3dOptions = {},
): Promise<Render3dResult> {
  const started = performance.now();
  if (
    !THREE_D_KINDS.has(spec.kind.type) ||
    (spec.kind.type === 'angular' && spec.kind.mode !== 'surface')
  ) {
    throw new AppError(422, 'not_3d', `kind.type: a ${spec.kind.type} figure is not drawn in 3D`, {
      'kind.type': 'not a 3D kind',
    });
  }
  const { widthPx, heightPx } = checkSize(spec);
  const timeoutMs = opts.timeoutMs ?? DEFAULT_TIMEOUT_MS;
  const job: PrintJob = {
    spec: opts.background
      ? { ...spec, print: { ...spec.print, background: opts.background } }
      : spec,
    widthPx,
    heightPx,
  };
  const { warm: w, launchMs } = await warmBrowser(path.resolve(opts.distDir ?? DEFAULT_DIST));
  const run = async (): Promise<Render3dResult> => {
    const pageErrors: string[] = [];
    let timer: NodeJS.Timeout | undefined;
    try {
      const work = (async () => {
        const pageStarted = performance.now();
        const page = await printPage(w, widthPx, heightPx, timeoutMs, pageErrors);
        const drawStarted = performance.now();
        const pageMs = drawStarted - pageStarted;
        const result = await page
          .evaluate((j) => window.__lobewrightPrint!(j), job)
          .catch((error: Error) => {
            const message = error.message.replace(/^page\.evaluate: (Error: )?/, '').split('\n')[0];
            throw new AppError(
              422,
              'render_failed',
              `the 3D figure could not be drawn: ${message}`,
            );
          });
        const drawMs = performance.now() - drawStarted;
        const captureStarted = performance.now();
        const dataUrl = await page.evaluate(() => window.__lobewrightCapture!());
        const png = Buffer.from(dataUrl.slice(dataUrl.indexOf(',') + 1), 'base64');
        return { png, result, pageMs, drawMs, captureMs: performance.now() - captureStarted };
      })();
      const timeout = new Promise<never>((_, reject) => {
        timer = setTimeout(
          () =>
            reject(
              new AppError(
                504,
                'render_timeout',
                `the 3D figure took longer than ${timeoutMs} ms to render`,
              ),
            ),
          timeoutMs,
        );
      });
      const { png, result, pageMs, drawMs, captureMs } = await Promise.race([work, timeout]);
      checkPng(png, widthPx, heightPx);
      return {
        png,
        widthPx,
        heightPx,
        facts: result.facts,
        notes: result.notes,
        projection: result.projection,
        ms: {
          launch: launchMs,
          page: pageMs,
          draw: drawMs,
          geometry: result.ms.geometry,
          capture: captureMs,
          total: performance.now() - started,
        },
      };
    } catch (error) {
      // A page that failed or timed out may be in any state: the next figure gets a fresh one.
      await discardPage(w);
      if (error instanceof AppError) throw error;
      const detail = pageErrors.length > 0 ? ` (page: ${pageErrors.join('; ')})` : '';
      throw new AppError(
        500,
        'render_failed',
        `the 3D figure could not be rendered: ${(error as Error).message}${detail}`,
        undefined,
        { cause: error },
      );
    } finally {
      clearTimeout(timer);
    }
  };
  const done = w.queue.then(run, run);
  w.queue = done.catch(() => undefined);
  return done;
}

/** The PNG's IHDR must say exactly the size asked for. */
function checkPng(png: Buffer, widthPx: number, heightPx: number): void {
  const signature = '89504e470d0a1a0a';
  if (png.length < 24 || png.subarray(0, 8).toString('hex') !== signature)
    throw new AppError(500, 'render_failed', 'the browser returned no PNG');
  const w = png.readUInt32BE(16);
  const h = png.readUInt32BE(20);
  if (w !== widthPx || h !== heightPx)
    throw new AppError(
      500,
      'render_failed',
      `the browser drew ${w} × ${h} px instead of ${widthPx} × ${heightPx} px`,
    );
}
