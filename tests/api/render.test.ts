// Print rendering through the API: exact sizes and dpi, fonts embedded, vector text, TIFF tags,
// identical bytes for the same spec, caching, limits and role checks.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { closeRender3d } from '../../api/render/render-3d';
import { demo, signedIn, type ApiClient } from '../support/api-client';
import { readTiffTags } from '../support/tiff-tags';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let viewer: ApiClient, editor: ApiClient, admin: ApiClient;
let chapter4: number;
let radialId: number; // demo figure 4.2: radial plot, 174 mm × 70 mm, 300 dpi (house style default dpi)
const out = mkdtempSync(path.join(tmpdir(), 'lw-render-'));

const binary = (c: ApiClient, url: string) => c.getBytes(url);

const poppler = (tool: string, file: string) => execFileSync(tool, [file, ...(tool === 'pdftotext' ? ['-'] : [])]).toString();

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'));
  [viewer, editor, admin] = await Promise.all([demo.viewer, demo.editor, demo.admin].map((e) => signedIn(server.baseUrl, e)));
  chapter4 = (await viewer.get('/api/projects')).body.find((p: { name: string }) => p.name.startsWith('Atoms & Bonds')).id;
  const figs = (await viewer.get(`/api/projects/${chapter4}/figures`)).body;
  radialId = figs.find((f: { number: string }) => f.number === '4.2').id;
});
afterAll(async () => {
  await closeRender3d();
  await server.stop();
});

describe('2D figure files', () => {
  it('when a viewer asks for a PNG, then it is round(mm / 25.4 × dpi) pixels with the dpi in its metadata', async () => {
    const r = await binary(viewer, `/api/figures/${radialId}/render?format=png`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toBe('image/png');
    const m = await sharp(r.bytes).metadata();
    // 174 mm and 70 mm at 300 dpi: 2055 × 827 px
    expect([m.width, m.height, m.density]).toEqual([Math.round((174 / 25.4) * 300), Math.round((70 / 25.4) * 300), 300]);
    expect(m.space).toBe('srgb');
  });

  it('when asked for a PDF, then the page is the figure size to 0.01 pt, fonts are embedded and labels are text', async () => {
    const r = await binary(viewer, `/api/figures/${radialId}/render?format=pdf`);
    expect(r.status).toBe(200);
    const file = path.join(out, 'radial.pdf');
    writeFileSync(file, r.bytes);
    const size = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(poppler('pdfinfo', file))!;
    expect(Number(size[1])).toBeCloseTo((174 / 25.4) * 72, 2); // 493.23 pt
    expect(Number(size[2])).toBeCloseTo((70 / 25.4) * 72, 2); // 198.43 pt
    const fonts = poppler('pdffonts', file).split('\n').slice(2).filter(Boolean);
    expect(fonts.length).toBeGreaterThan(0);
    for (const line of fonts) expect(line).toMatch(/\byes\s+yes\s+(yes|no)\s+\d+\s+\d+\s*$/); // embedded, subset
    const text = poppler('pdftotext', file);
    expect(text).toMatch(/bohr/);
    expect(text).toMatch(/3s/);
  });

  it('when asked for SVG, then it is a standalone SVG sized in millimetres', async () => {
    const r = await binary(viewer, `/api/figures/${radialId}/render?format=svg`);
    expect(r.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
    const svg = r.bytes.toString('utf8');
    expect(svg).toMatch(/<svg[^>]*width="174mm"[^>]*height="70mm"/);
  });

  it('when asked for TIFF, then it is LZW-compressed with the dpi in its resolution tags', async () => {
    const r = await binary(viewer, `/api/figures/${radialId}/render?format=tiff`);
    expect(r.headers.get('content-type')).toBe('image/tiff');
    expect(readTiffTags(r.bytes)).toMatchObject({ compression: 5, resolutionUnit: 2 });
    expect(readTiffTags(r.bytes).xResolution).toBeCloseTo(300, 6);
    const cmyk = await binary(viewer, `/api/figures/${radialId}/render?format=tiff&cmyk=true`);
    expect((await sharp(cmyk.bytes).metadata()).space).toBe('cmyk');
    expect(decodeURIComponent(cmyk.headers.get('x-lobewright-notes')!)).toMatch(/colours shift/);
  });

  it('when the same spec is rendered again without the cache, then the bytes are identical', async () => {
    for (const format of ['png', 'pdf', 'svg']) {
      const first = await binary(viewer, `/api/figures/${radialId}/render?format=${format}`);
      await server.db('render_cache').delete();
      const second = await binary(viewer, `/api/figures/${radialId}/render?format=${format}`);
      expect(second.headers.get('x-lobewright-cache')).toBe('miss');
      expect(second.bytes.equals(first.bytes)).toBe(true);
      const third = await binary(viewer, `/api/figures/${radialId}/render?format=${format}`);
      expect(third.headers.get('x-lobewright-cache')).toBe('hit');
    }
  });
});

describe('limits and access', () => {
  it('when the format is unknown, then 400 names "query.format"', async () => {
    const r = await viewer.get(`/api/figures/${radialId}/render?format=gif`);
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('query.format');
  });

  it('when the raster would be too large, then 413 names the print field and nothing is cached', async () => {
    const spec = {
      schemaVersion: 1,
      state: { terms: [{ n: 2, l: 0, m: 0 }] },
      kind: { type: 'radial', curves: [{ n: 2, l: 0, quantity: 'R' }] },
      print: { widthMm: 500, heightMm: 100, dpi: 1200 },
    };
    const f = (await editor.post(`/api/projects/${chapter4}/figures`, { title: 'Huge', spec })).body;
    const before = await server.db('render_cache').count('* as n').first();
    const r = await editor.get(`/api/figures/${f.id}/render?format=png`);
    expect(r.status).toBe(413);
    expect(r.body.error.fields).toHaveProperty('print.widthMm');
    expect(await server.db('render_cache').count('* as n').first()).toEqual(before);
  });

  it('when a valid spec cannot be drawn (a level the potential does not bind), then 422 names the field', async () => {
    const spec = {
      schemaVersion: 1,
      state: { terms: [{ n: 3, l: 2, m: 0 }] },
      kind: {
        type: 'radial',
        curves: [{ n: 3, l: 2, quantity: 'R', source: 'solved' }],
        potential: { type: 'yukawa', Z: 1, lambda: 0.5 },
      },
    };
    const f = (await editor.post(`/api/projects/${chapter4}/figures`, { title: 'Unbound', spec })).body;
    const r = await editor.get(`/api/figures/${f.id}/render?format=svg`);
    expect(r.status).toBe(422);
    expect(r.body.error.code).toBe('cannot_draw');
    expect(r.body.error.fields['kind.curves[0].l']).toMatch(/binds no level with l = 2/);
  });

  it('when someone outside the project asks, then 404; an old revision can be rendered by number', async () => {
    expect((await admin.get(`/api/figures/${radialId}/render?format=svg`)).status).toBe(404);
    expect((await binary(viewer, `/api/figures/${radialId}/render?format=svg&revision=1`)).status).toBe(200);
    expect((await viewer.get(`/api/figures/${radialId}/render?format=svg&revision=99`)).status).toBe(404);
  });
});

describe('3D figure files', () => {
  it('when a 3D isosurface is rendered, then the PNG has the exact size and the PDF holds it with the page size', async () => {
    const figs = (await viewer.get(`/api/projects/${chapter4}/figures`)).body;
    const id = figs.find((f: { number: string }) => f.number === '4.3').id; // 2p_z, 84 mm square, 300 dpi
    const png = await binary(viewer, `/api/figures/${id}/render?format=png`);
    expect(png.status).toBe(200);
    const m = await sharp(png.bytes).metadata();
    expect([m.width, m.height, m.density, m.hasAlpha]).toEqual([992, 992, 300, true]);
    const pdf = await binary(viewer, `/api/figures/${id}/render?format=pdf`);
    const file = path.join(out, 'iso.pdf');
    writeFileSync(file, pdf.bytes);
    const size = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(poppler('pdfinfo', file))!;
    expect(Number(size[1])).toBeCloseTo((84 / 25.4) * 72, 2);
    expect(execFileSync('pdfimages', ['-list', file]).toString()).toMatch(/992\s+992/);
  });
});
