// Benchmark: 3D figures to PNG at 84 mm and 600 dpi (1984 px square) through the warm browser.
// Prints JSON: per figure the first (cold) and the following warm renders, in milliseconds.
// Needs the built client: npx vite build. Run: npx tsx scripts/bench-render-3d.ts [repeats]
import { writeFileSync, mkdirSync } from 'node:fs';
import { closeRender3d, render3dPng } from '../api/render/render-3d';
import { figureSpecSchema, type FigureSpecInput } from '../shared/spec/figure-spec';
import { defaultHouseStyle } from '../shared/spec/house-style';
import { resolveFigureSpec } from '../shared/spec/resolve-figure-spec';

const repeats = Number(process.argv[2] ?? 3);
const print = { widthMm: 84, heightMm: 84, dpi: 600 };
const figures: Record<string, FigureSpecInput> = {
  '3d_z2-isosurface-grid96': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: { type: 'isosurface', grid: 96 },
    print,
  },
  '4f-isosurface-grid128-outer': {
    schemaVersion: 1,
    state: { terms: [{ n: 4, l: 3, m: 1 }] },
    kind: { type: 'isosurface', grid: 128, outerSurface: { enclosed: 0.99, opacity: 0.25 } },
    look: { showNodalSurfaces: true },
    print,
  },
  '3p_z-cloud-100k': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 1, m: 0 }] },
    kind: { type: 'cloud', points: 100_000 },
    print,
  },
  '3d_xy-angular': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: -2 }] },
    kind: { type: 'angular' },
    print,
  },
};

const results: Record<string, unknown> = {};
mkdirSync('test-output', { recursive: true });
for (const [name, input] of Object.entries(figures)) {
  const spec = resolveFigureSpec(figureSpecSchema.parse(input), defaultHouseStyle);
  const runs = [];
  for (let i = 0; i < repeats; i++) {
    const r = await render3dPng(spec);
    runs.push({
      ...r.ms,
      bytes: r.png.length,
      triangles: r.facts.triangles.total,
      points: r.facts.points,
    });
    if (i === 0) writeFileSync(`test-output/bench-render-3d-${name}.png`, r.png);
  }
  const warm = runs.slice(1).map((r) => r.total);
  results[name] = {
    widthPx: 1984,
    runs,
    warmTotalMs: warm.length
      ? {
          min: Math.min(...warm),
          max: Math.max(...warm),
          mean: warm.reduce((a, b) => a + b, 0) / warm.length,
        }
      : null,
  };
}
await closeRender3d();
console.log(
  JSON.stringify(
    { benchmark: 'render-3d', size: '84 mm @ 600 dpi', results },
    (_k, v: unknown) => (typeof v === 'number' ? Math.round(v * 10) / 10 : v),
    2,
  ),
);
