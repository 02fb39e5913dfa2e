// 3D print rendering through Debian's Chromium: a 2p_z isosurface seen from the side, at an exact
// pixel size, with the phase colours where the lobes are and the background at the nucleus, where
// the nodal plane xy is seen edge-on. Needs the built client (dist/app, scripts/test builds it).
import sharp from 'sharp';
import { afterAll, describe, expect, it } from 'vitest';
import { AppError } from '../../api/lib/app-error';
import { closeRender3d, render3dPng } from '../../api/render/render-3d';
import { figureSpecSchema, type FigureSpecInput } from '../../shared/spec/figure-spec';
import { defaultHouseStyle } from '../../shared/spec/house-style';
import { resolveFigureSpec, type ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';

const POSITIVE = '#c2410c';
const NEGATIVE = '#0f766e';

function spec(overrides: Partial<FigureSpecInput> = {}): ResolvedFigureSpec {
  const input: FigureSpecInput = {
    schemaVersion: 1,
    state: { terms: [{ n: 2, l: 1, m: 0 }] },
    kind: { type: 'isosurface', enclosed: 0.9, grid: 64 },
    // Azimuth −90°, elevation 0°: looking along +y, x to the right and z up.
    view: { azimuthDeg: -90, elevationDeg: 0, lighting: 'flat' },
    look: {
      positiveColour: POSITIVE,
      negativeColour: NEGATIVE,
      showAxes: false,
      showScaleBar: false,
    },
    print: { widthMm: 40, heightMm: 40, dpi: 150, background: 'transparent' },
    ...overrides,
  };
  return resolveFigureSpec(figureSpecSchema.parse(input), defaultHouseStyle);
}

async function pixels(
  png: Buffer,
): Promise<{ width: number; height: number; at: (x: number, y: number) => number[] }> {
  const { data, info } = await sharp(png).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return {
    width: info.width,
    height: info.height,
    at: (x, y) => {
      const o = 4 * (Math.round(y) * info.width + Math.round(x));
      return [data[o], data[o + 1], data[o + 2], data[o + 3]];
    },
  };
}

const rgb = (hex: string): number[] => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

function expectColour(got: number[], hex: string, where: string): void {
  const want = [...rgb(hex), 255];
  const worst = Math.max(...got.map((v, i) => Math.abs(v - want[i])));
  expect(
    worst,
    `${where}: got rgba(${got.join(', ')}), expected rgba(${want.join(', ')}), tolerance 2 levels`,
  ).toBeLessThanOrEqual(2);
}

describe('render3dPng', () => {
  afterAll(async () => {
    await closeRender3d();
  });

  it('when a 2p_z isosurface is printed at 40 mm and 150 dpi seen along y, then the PNG is 236 × 236 px with +phase above, −phase below and background at the nucleus', async () => {
    const result = await render3dPng(spec());
    // round(40 / 25.4 × 150) = round(236.22) = 236.
    expect([result.widthPx, result.heightPx]).toEqual([236, 236]);
    expect(result.png.readUInt32BE(16)).toBe(236);
    expect(result.png.readUInt32BE(20)).toBe(236);
    const image = await pixels(result.png);
    expect([image.width, image.height]).toEqual([236, 236]);

    const [nx, ny] = result.projection.nucleus;
    expect(nx).toBeCloseTo(118, 6);
    expect(ny).toBeCloseTo(118, 6);
    // 2 bohr above and below the nucleus: |ψ_2p_z|² peaks on the z axis at r = 2 bohr (REFERENCE.md §8),
    // well inside the 90 % lobes. Flat lighting draws the look's colours unshaded.
    const step = 2 * result.projection.pixelsPerBohr;
    expectColour(image.at(nx, ny - step), POSITIVE, 'z = +2 bohr');
    expectColour(image.at(nx, ny + step), NEGATIVE, 'z = −2 bohr');
    expect(image.at(nx, ny)[3], 'alpha at the nucleus (nodal plane)').toBe(0);
    expect(image.at(2, 2)[3], 'alpha in the corner').toBe(0);
    expect(result.facts.enclosed?.requested).toBe(0.9);
    expect(Math.abs((result.facts.enclosed?.achieved ?? 0) - 0.9)).toBeLessThan(0.01);
    expect(result.facts.nodes).toEqual({ radial: 0, angular: 1 });
    expect(result.facts.triangles.positive).toBeGreaterThan(100);
    expect(result.facts.triangles.positive).toBe(result.facts.triangles.negative);
  });

  it('when the background is white and the view is shaded, then the nucleus is white and the lobes keep their hue', async () => {
    const result = await render3dPng(
      spec({ view: { azimuthDeg: -90, elevationDeg: 0, lighting: 'soft' } }),
      { background: 'white' },
    );
    const image = await pixels(result.png);
    const [nx, ny] = result.projection.nucleus;
    expect(image.at(nx, ny)).toEqual([255, 255, 255, 255]);
    const above = image.at(nx, ny - 2 * result.projection.pixelsPerBohr);
    const below = image.at(nx, ny + 2 * result.projection.pixelsPerBohr);
    expect(above[0], `above: rgba(${above.join(', ')}) should be reddest`).toBeGreaterThan(
      above[1],
    );
    expect(below[1], `below: rgba(${below.join(', ')}) should be greener than red`).toBeGreaterThan(
      below[0],
    );
  });

  it('when axes and a scale bar are asked for, then the projection places them in the picture', async () => {
    const result = await render3dPng(spec({ look: { showAxes: true, showScaleBar: true } }));
    const { axes, scaleBar, widthPx, heightPx } = result.projection;
    expect(axes.map((a) => a.name)).toEqual(['x', 'y', 'z']);
    for (const a of axes) {
      expect(a.end[0]).toBeGreaterThanOrEqual(0);
      expect(a.end[0]).toBeLessThanOrEqual(widthPx);
      expect(a.end[1]).toBeGreaterThanOrEqual(0);
      expect(a.end[1]).toBeLessThanOrEqual(heightPx);
    }
    // Seen along y: +x points right and +z up from the nucleus.
    expect(axes[0].end[0]).toBeGreaterThan(118);
    expect(axes[2].end[1]).toBeLessThan(118);
    expect(scaleBar).not.toBeNull();
    expect((scaleBar!.to[0] - scaleBar!.from[0]) / result.projection.pixelsPerBohr).toBeCloseTo(
      scaleBar!.lengthBohr,
      9,
    );
  });

  it('when figures of different sizes follow each other on the warm page, then each PNG has its own exact size', async () => {
    // round(30 / 25.4 × 300) = 354, round(20 / 25.4 × 300) = 236; then back to 236 × 236.
    const wide = await render3dPng(
      spec({
        kind: { type: 'cloud', points: 2000, seed: 5 },
        print: { widthMm: 30, heightMm: 20, dpi: 300 },
      }),
    );
    const wideImage = await pixels(wide.png);
    expect([wideImage.width, wideImage.height]).toEqual([354, 236]);
    expect(wide.projection.nucleus[0]).toBeCloseTo(177, 6);
    expect(wide.projection.nucleus[1]).toBeCloseTo(118, 6);
    const square = await pixels((await render3dPng(spec())).png);
    expect([square.width, square.height]).toEqual([236, 236]);
  });

  it('when a cloud and an angular surface are printed, then the facts say what was drawn and the angular plot has no scale bar', async () => {
    const cloud = await render3dPng(
      spec({ kind: { type: 'cloud', points: 5000, seed: 9 }, look: { showScaleBar: true } }),
    );
    expect(cloud.facts.points).toBe(5000);
    // One term: nothing is rejected (shared/sampling/sample-cloud.ts).
    expect(cloud.facts.acceptance).toBe(1);
    expect(cloud.projection.scaleBar).not.toBeNull();
    const cloudImage = await pixels(cloud.png);
    expect(cloudImage.at(2, 2)[3]).toBe(0);
    const angular = await render3dPng(
      spec({ kind: { type: 'angular' }, look: { showScaleBar: true } }),
    );
    expect(angular.projection.scaleBar).toBeNull();
    expect(angular.notes.join(' ')).toMatch(/no scale bar/);
    // Seen along y the p_z polar surface is two touching circles: +phase above, −phase below the nucleus.
    const image = await pixels(angular.png);
    const [nx, ny] = angular.projection.nucleus;
    const lobe = 0.5 * Math.sqrt(3 / (4 * Math.PI)) * angular.projection.pixelsPerBohr; // centre of the upper circle, |S_10| max = √(3/4π)
    expectColour(image.at(nx, ny - lobe), POSITIVE, 'angular, upper lobe');
    expectColour(image.at(nx, ny + lobe), NEGATIVE, 'angular, lower lobe');
  });

  it('when the same spec is printed twice, then the PNG bytes are identical', async () => {
    const cloudSpec = spec({
      kind: { type: 'cloud', points: 3000, seed: 4 },
      look: { showAxes: true, showScaleBar: true },
    });
    const first = await render3dPng(cloudSpec);
    await render3dPng(spec());
    const second = await render3dPng(cloudSpec);
    expect(first.png.equals(second.png)).toBe(true);
  });

  it('when the spec is invalid inside, then the error names the field and the next figure still renders', async () => {
    const bad = {
      ...spec(),
      state: { terms: [{ n: 2, l: 2, m: 0, basis: 'real', weight: { re: 1, im: 0 } }], time: 0 },
    };
    await expect(render3dPng(bad as ResolvedFigureSpec)).rejects.toMatchObject({
      code: 'render_failed',
      message: expect.stringContaining('spec.state.terms.0.l: l must be less than n (2)'),
    });
    const next = await render3dPng(spec());
    expect([next.widthPx, next.heightPx]).toEqual([236, 236]);
  });

  it('when the figure would exceed the size limit or is not a 3D kind, then a clear error names the field', async () => {
    const tooLarge = spec({ print: { widthMm: 500, heightMm: 40, dpi: 1200 } });
    await expect(render3dPng(tooLarge)).rejects.toMatchObject({
      code: 'figure_too_large',
      fields: { 'print.widthMm': expect.stringContaining('23622 px') },
    });
    const slice = spec({ kind: { type: 'slice' } });
    await expect(render3dPng(slice)).rejects.toBeInstanceOf(AppError);
    await expect(render3dPng(slice)).rejects.toMatchObject({ code: 'not_3d' });
  });
});
