/**
 * Timings of the 2D print path: spec → scene → PNG and → PDF at 84 mm and 600 dpi, one figure of
 * each 2D kind, printed as JSON (median of a few runs after one warm-up).
 *
 *   npx tsx scripts/bench-render-2d.ts [--runs 5] [--out dir]   (--out also writes the files)
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { sceneToPdf } from '../api/render/scene-to-pdf';
import { sceneToPng } from '../api/render/scene-to-png';
import { buildFigureScene } from '../shared/figures/build-figure-scene';
import { sceneToSvg } from '../shared/figures/scene-to-svg';
import { figureSpecSchema, type FigureSpecInput } from '../shared/spec/figure-spec';
import { defaultHouseStyle } from '../shared/spec/house-style';
import { resolveFigureSpec, type ResolvedFigureSpec } from '../shared/spec/resolve-figure-spec';

const print = { widthMm: 84, heightMm: 64, dpi: 600, background: 'white' as const };

export const BENCH_SPECS: Record<string, FigureSpecInput> = {
  'radial-2s-2p': {
    schemaVersion: 1,
    state: { terms: [{ n: 2, l: 0, m: 0 }] },
    kind: {
      type: 'radial',
      curves: [
        { n: 2, l: 0, quantity: 'r2R2' },
        { n: 2, l: 1, quantity: 'r2R2' },
        { n: 3, l: 2, quantity: 'r2R2' },
      ],
    },
    print,
  },
  'radial-mixed-pm': {
    schemaVersion: 1,
    system: { Z: 1, nucleus: 'H-1', lengthUnit: 'pm' },
    state: { terms: [{ n: 3, l: 0, m: 0 }] },
    kind: {
      type: 'radial',
      curves: [
        { n: 3, l: 0, quantity: 'R' },
        { n: 3, l: 1, quantity: 'R' },
        { n: 3, l: 0, quantity: 'cumulative' },
      ],
    },
    print: { ...print, heightMm: 84 },
  },
  'radial-veff': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: {
      type: 'radial',
      curves: [
        { n: 2, l: 1, quantity: 'veff' },
        { n: 3, l: 1, quantity: 'veff' },
        { n: 3, l: 2, quantity: 'veff' },
      ],
    },
    print,
  },
  'slice-3dz2-psi': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: {
      type: 'slice',
      plane: 'xz',
      quantity: 'psi',
      contours: { mode: 'enclosed', fractions: [0.5, 0.9] },
    },
    print: { ...print, heightMm: 78 },
  },
  'slice-2s-density-angstrom': {
    schemaVersion: 1,
    system: { Z: 1, nucleus: 'infinite', lengthUnit: 'angstrom' },
    state: {
      terms: [
        { n: 2, l: 0, m: 0 },
        { n: 2, l: 1, m: 0 },
      ],
    },
    kind: {
      type: 'slice',
      plane: 'xz',
      quantity: 'density',
      contours: { mode: 'levels', levels: [0.0005, 0.002] },
    },
    print: { ...print, heightMm: 78 },
  },
  'levels-h1-balmer': {
    schemaVersion: 1,
    system: { Z: 1, nucleus: 'H-1', lengthUnit: 'bohr' },
    state: { terms: [{ n: 1, l: 0, m: 0 }] },
    kind: {
      type: 'levels',
      nMax: 6,
      transitions: [
        { upper: 2, lower: 1 },
        { upper: 3, lower: 1 },
        { upper: 3, lower: 2 },
        { upper: 4, lower: 2 },
        { upper: 5, lower: 2 },
        { upper: 4, lower: 3 },
      ],
    },
    print: { ...print, heightMm: 70 },
  },
  'angular-3dz2-curve': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: { type: 'angular', mode: 'curve', quantity: 'real', plane: 'xz' },
    look: { showNodalSurfaces: true },
    print: { ...print, heightMm: 84 },
  },
  'angular-sp3-curve': {
    schemaVersion: 1,
    state: {
      terms: [
        { n: 2, l: 0, m: 0, weight: { re: 0.5, im: 0 } },
        { n: 2, l: 1, m: 1, weight: { re: 0.5, im: 0 } },
        { n: 2, l: 1, m: -1, weight: { re: 0.5, im: 0 } },
        { n: 2, l: 1, m: 0, weight: { re: 0.5, im: 0 } },
      ],
    },
    kind: { type: 'angular', mode: 'curve', quantity: 'real', plane: 'xz' },
    print: { ...print, heightMm: 84 },
  },
};

function resolve(input: FigureSpecInput): ResolvedFigureSpec {
  return resolveFigureSpec(figureSpecSchema.parse(input), defaultHouseStyle);
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  const runs = Number(args[args.indexOf('--runs') + 1]) || 5;
  const out = args.includes('--out') ? args[args.indexOf('--out') + 1] : null;
  if (out) mkdirSync(out, { recursive: true });
  const results: Record<string, unknown> = {};
  for (const [name, input] of Object.entries(BENCH_SPECS)) {
    const spec = resolve(input);
    const times = {
      sceneMs: [] as number[],
      pngMs: [] as number[],
      pdfMs: [] as number[],
      svgMs: [] as number[],
    };
    let sizes = { png: 0, pdf: 0, svg: 0 };
    for (let i = 0; i <= runs; i++) {
      let t = performance.now();
      const scene = buildFigureScene(spec);
      const sceneMs = performance.now() - t;
      t = performance.now();
      const svg = sceneToSvg(scene);
      const svgMs = performance.now() - t;
      t = performance.now();
      const png = await sceneToPng(buildFigureScene(spec));
      const pngMs = performance.now() - t + sceneMs;
      t = performance.now();
      const pdf = await sceneToPdf(buildFigureScene(spec));
      const pdfMs = performance.now() - t + sceneMs;
      if (i === 0) {
        sizes = { png: png.length, pdf: pdf.length, svg: svg.length };
        if (out) {
          writeFileSync(join(out, `${name}.png`), png);
          writeFileSync(join(out, `${name}.pdf`), pdf);
          writeFileSync(join(out, `${name}.svg`), svg);
        }
        continue; // warm-up
      }
      times.sceneMs.push(sceneMs);
      times.svgMs.push(svgMs);
      times.pngMs.push(pngMs);
      times.pdfMs.push(pdfMs);
    }
    results[name] = {
      widthMm: spec.print.widthMm,
      heightMm: spec.print.heightMm,
      dpi: spec.print.dpi,
      sceneMs: +median(times.sceneMs).toFixed(1),
      svgMs: +median(times.svgMs).toFixed(1),
      specToPngMs: +median(times.pngMs).toFixed(1),
      specToPdfMs: +median(times.pdfMs).toFixed(1),
      bytes: sizes,
    };
  }
  console.log(JSON.stringify({ benchmark: 'render-2d', runs, results }, null, 2));
}

await main();
