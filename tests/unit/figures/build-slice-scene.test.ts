// Slices: the colour field is a raster at the print dpi with the phases where the physics puts them,
// contours by enclosed fraction match the sphere of REFERENCE.md §9 (1s, p = 0.9: r = 2.661 160 a0),
// cautions are recorded, and bad requests name the field.
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { FigureSpecError } from '../../../shared/figures/figure-error';
import type { ImageNode, PathNode } from '../../../shared/figures/scene';
import { nodesWithRole, resolved, textsWithRole, xOfValue } from './figure-test-helpers';

const print = { widthMm: 84, heightMm: 80, dpi: 300 };

function pixel(image: ImageNode, fx: number, fy: number): number[] {
  const x = Math.floor(fx * image.pixelWidth);
  const y = Math.floor(fy * image.pixelHeight);
  const o = 4 * (y * image.pixelWidth + x);
  return [...image.rgba.subarray(o, o + 4)];
}

describe('slice scene', () => {
  it('when 2p_z ψ is sliced in the xz-plane, then the raster has the print dpi, +z is the positive colour and −z the negative', () => {
    const scene = buildFigureScene(
      resolved({
        schemaVersion: 1,
        state: { terms: [{ n: 2, l: 1, m: 0 }] },
        kind: { type: 'slice', plane: 'xz', quantity: 'psi' },
        print,
      }),
    );
    const image = nodesWithRole(scene.children, 'colour-field')[0] as ImageNode;
    expect(image.width).toBeCloseTo((image.pixelWidth * 25.4) / 300, 9);
    expect(image.height).toBeCloseTo((image.pixelHeight * 25.4) / 300, 9);
    // Default look: positive #c2410c, negative #0f766e. 2p_z ∝ z (REFERENCE §5): above the centre positive.
    const above = pixel(image, 0.5, 0.35);
    const below = pixel(image, 0.5, 0.65);
    expect(above[0]).toBeGreaterThan(above[2]);
    expect(below[2]).toBeGreaterThan(below[0]);
    expect(
      pixel(image, 0.02, 0.5)
        .slice(0, 3)
        .every((c) => c > 240),
    ).toBe(true);
    expect(
      textsWithRole(scene, 'title')[0]
        .runs.map((r) => r.text)
        .join(''),
    ).toBe('2pz, ψ in the xz-plane');
    expect(scene.metadata.notes.some((n) => n.includes('do not enclose those fractions'))).toBe(
      true,
    );
  });

  it('when 1s density contours enclose 90 %, then the contour is a circle of radius 2.661 bohr (REFERENCE §9), to the grid accuracy', () => {
    const scene = buildFigureScene(
      resolved({
        schemaVersion: 1,
        state: { terms: [{ n: 1, l: 0, m: 0 }] },
        kind: {
          type: 'slice',
          plane: 'xy',
          quantity: 'density',
          extent: 5,
          contours: { mode: 'enclosed', fractions: [0.9] },
        },
        print,
      }),
    );
    const ticks = textsWithRole(scene, 'x-tick-label');
    const mmPerBohr = xOfValue(ticks, 1) - xOfValue(ticks, 0);
    const centre = xOfValue(ticks, 0);
    const image = nodesWithRole(scene.children, 'colour-field')[0] as ImageNode;
    const cy = image.y + image.height / 2;
    const contour = nodesWithRole(scene.children, 'contour') as PathNode[];
    expect(contour).toHaveLength(1);
    for (const c of contour[0].commands) {
      if (c.op === 'close' || c.op === 'cubic') continue;
      const r = Math.hypot(c.x - centre, c.y - cy) / mmPerBohr;
      expect(Math.abs(r - 2.661160168917105)).toBeLessThan(0.03);
    }
  });

  it('when contours are at chosen levels, then the scene says they enclose no stated probability', () => {
    const scene = buildFigureScene(
      resolved({
        schemaVersion: 1,
        state: { terms: [{ n: 1, l: 0, m: 0 }] },
        kind: {
          type: 'slice',
          plane: 'xy',
          quantity: 'density',
          contours: { mode: 'levels', levels: [0.01] },
        },
        print,
      }),
    );
    expect(
      scene.metadata.notes.some((n) => n.includes('does not enclose any stated probability')),
    ).toBe(true);
  });

  it('when ψ is complex and asked for, then the error names kind.quantity', () => {
    const spec = resolved({
      schemaVersion: 1,
      state: { terms: [{ n: 2, l: 1, m: 1, basis: 'complex' }] },
      kind: { type: 'slice', plane: 'xy', quantity: 'psi' },
      print,
    });
    expect(() => buildFigureScene(spec)).toThrow(FigureSpecError);
    expect(() => buildFigureScene(spec)).toThrow(/^kind\.quantity:/);
  });
});
