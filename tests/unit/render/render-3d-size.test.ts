// 3D print sizes: pixels from millimetres and dpi, and the limits that refuse oversized rasters
// before any browser is started.
import { describe, expect, it } from 'vitest';
import { MAX_3D_SIDE_PX, printPixels, render3dPng } from '../../../api/render/render-3d';
import { figureSpecSchema, type FigureSpecInput } from '../../../shared/spec/figure-spec';
import { defaultHouseStyle } from '../../../shared/spec/house-style';
import { resolveFigureSpec } from '../../../shared/spec/resolve-figure-spec';

const spec = (
  print: FigureSpecInput['print'],
  kind: FigureSpecInput['kind'] = { type: 'isosurface' },
) =>
  resolveFigureSpec(
    figureSpecSchema.parse({
      schemaVersion: 1,
      state: { terms: [{ n: 2, l: 1, m: 0 }] },
      kind,
      print,
    }),
    defaultHouseStyle,
  );

describe('printPixels', () => {
  it('when a publisher size is asked for, then the side is round(mm / 25.4 × dpi)', () => {
    // 84 mm single column, 174 mm double column (common practice), at 300 and 600 dpi.
    expect(printPixels(84, 600)).toBe(1984); // 1984.25
    expect(printPixels(84, 300)).toBe(992); // 992.13
    expect(printPixels(174, 600)).toBe(4110); // 4110.24
    expect(printPixels(40, 150)).toBe(236); // 236.22
    expect(printPixels(25.4, 72)).toBe(72);
  });
});

describe('render3dPng size limits', () => {
  it('when a side exceeds the limit, then the error names the field and the pixel count', async () => {
    await expect(render3dPng(spec({ widthMm: 300, heightMm: 84, dpi: 600 }))).rejects.toMatchObject(
      {
        status: 422,
        code: 'figure_too_large',
        fields: {
          'print.widthMm': `300 mm at 600 dpi is 7087 px; 3D figures are limited to ${MAX_3D_SIDE_PX} px per side`,
        },
      },
    );
    await expect(
      render3dPng(spec({ widthMm: 84, heightMm: 400, dpi: 1200 })),
    ).rejects.toMatchObject({ fields: { 'print.heightMm': expect.stringContaining('18898 px') } });
  });
  it('when both sides fit but the area is too large, then the error points at the dpi', async () => {
    // 254 mm at 600 dpi = 6000 px per side: 36 million pixels.
    await expect(
      render3dPng(spec({ widthMm: 254, heightMm: 254, dpi: 600 })),
    ).rejects.toMatchObject({
      code: 'figure_too_large',
      fields: { 'print.dpi': expect.stringContaining('6000 × 6000 px') },
    });
  });
  it('when the kind is 2D or an angular curve, then it is refused as not 3D', async () => {
    await expect(
      render3dPng(spec({}, { type: 'radial', curves: [{ n: 1, l: 0, quantity: 'R' }] })),
    ).rejects.toMatchObject({ code: 'not_3d' });
    await expect(render3dPng(spec({}, { type: 'angular', mode: 'curve' }))).rejects.toMatchObject({
      code: 'not_3d',
    });
  });
});
