// PNG output read back with sharp's decoder: exact pixel size round(mm / 25.4 × dpi), the dpi in the
// file, sRGB, transparent or white as asked, and identical bytes on a second render.
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { pixelSize, sceneToPng } from '../../../api/render/scene-to-png';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import type { ImageNode } from '../../../shared/figures/scene';
import { nodesWithRole, resolved } from '../figures/figure-test-helpers';

function radialSpec(background: 'white' | 'transparent') {
  return resolved({
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: { type: 'radial', curves: [{ n: 3, l: 2, quantity: 'R' }] },
    print: { widthMm: 84, heightMm: 60, dpi: 300, background },
  });
}

describe('scene to PNG', () => {
  it('when printed at 84 × 60 mm and 300 dpi, then the PNG is 992 × 709 px carrying 300 dpi, sRGB', async () => {
    const png = await sceneToPng(buildFigureScene(radialSpec('white')));
    const meta = await sharp(png).metadata();
    expect(pixelSize({ widthMm: 84, heightMm: 60, dpi: 300 })).toEqual({ width: 992, height: 709 });
    expect([meta.format, meta.width, meta.height, meta.density, meta.space]).toEqual([
      'png',
      992,
      709,
      300,
      'srgb',
    ]);
    const { data } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
    expect([...data.subarray(0, 4)]).toEqual([255, 255, 255, 255]);
  });

  it('when the background is transparent, then an empty corner has alpha 0 and the curve is drawn', async () => {
    const png = await sceneToPng(buildFigureScene(radialSpec('transparent')));
    const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
    expect(info.channels).toBe(4);
    expect(data[3]).toBe(0);
    let inked = 0;
    for (let i = 3; i < data.length; i += 4) if (data[i] > 0) inked++;
    expect(inked).toBeGreaterThan(5000);
  });

  it('when rendered twice, then the bytes are identical', async () => {
    const a = await sceneToPng(buildFigureScene(radialSpec('white')));
    const b = await sceneToPng(buildFigureScene(radialSpec('white')));
    expect(Buffer.compare(a, b)).toBe(0);
  });

  it('when a slice is printed, then its colour field lands on the page pixel for pixel', async () => {
    const scene = buildFigureScene(
      resolved({
        schemaVersion: 1,
        state: { terms: [{ n: 2, l: 1, m: 0 }] },
        kind: {
          type: 'slice',
          plane: 'xz',
          quantity: 'psi',
          contours: { mode: 'enclosed', fractions: [] },
        },
        print: { widthMm: 84, heightMm: 80, dpi: 300, background: 'white' },
      }),
    );
    const field = nodesWithRole(scene.children, 'colour-field')[0] as ImageNode;
    const { data, info } = await sharp(await sceneToPng(scene))
      .raw()
      .toBuffer({ resolveWithObject: true });
    const left = Math.round((field.x * 300) / 25.4);
    const top = Math.round((field.y * 300) / 25.4);
    for (const [ix, iy] of [
      [5, 5],
      [field.pixelWidth >> 1, field.pixelHeight >> 2],
      [field.pixelWidth - 6, field.pixelHeight - 6],
    ]) {
      const page = 4 * ((top + iy) * info.width + left + ix);
      const src = 4 * (iy * field.pixelWidth + ix);
      expect([...data.subarray(page, page + 4)]).toEqual([...field.rgba.subarray(src, src + 4)]);
    }
  });
});
