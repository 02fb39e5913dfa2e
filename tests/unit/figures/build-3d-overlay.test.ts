// The 3D overlay places its labels with the renderer's projection: axis names just past the axis ends,
// a scale bar whose printed length matches its drawn length, the orbital label typeset.
import { describe, expect, it } from 'vitest';
import {
  build3dOverlay,
  linearProjection,
  type OverlayProjection,
} from '../../../shared/figures/build-3d-overlay';
import { runsText, type PathNode } from '../../../shared/figures/scene';
import { resolved, textsWithRole, nodesWithRole } from './figure-test-helpers';

/** Looking along −y (front view): x to the right, z up, 2 mm per bohr, nucleus at the page centre. */
const front: OverlayProjection = {
  project: ([x, , z]) => [42 + 2 * x, 42 - 2 * z],
  mmPerBohr: 2,
  axisLengthBohr: 15,
};

function spec(lengthUnit: 'bohr' | 'angstrom') {
  return resolved({
    schemaVersion: 1,
    system: { lengthUnit },
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: { type: 'isosurface' },
    look: { showAxes: true, showScaleBar: true, showLabel: true },
    print: { widthMm: 84, heightMm: 84 },
  });
}

describe('3D overlay', () => {
  it('when seen from the front, then x and z are named past their axis ends and y (pointing at the viewer) is not', () => {
    const { nodes } = build3dOverlay(spec('bohr'), front);
    const names = textsWithRole(nodes, 'axis-label');
    expect(names.map((t) => runsText(t.runs))).toEqual(['x', 'z']);
    expect(names[0].x).toBeCloseTo(42 + 30 + 2, 9);
    expect(names[1].x).toBeCloseTo(42, 9);
    expect(names[1].y).toBeLessThan(42 - 30);
  });

  it('when the raster draws no bar, then a bar of a round length near a fifth of the width is drawn and labelled', () => {
    const { nodes, facts } = build3dOverlay(spec('bohr'), front);
    // 0.2 × 84 mm / 2 mm per bohr = 8.4 bohr → 5 bohr, i.e. 10 mm.
    const bar = nodesWithRole(nodes, 'scale-bar')[0] as PathNode;
    const [a, b] = bar.commands;
    if (a.op !== 'move' || b.op !== 'line') throw new Error('bar is a line');
    expect(b.x - a.x).toBeCloseTo(10, 9);
    expect(runsText(textsWithRole(nodes, 'scale-bar-label')[0].runs)).toBe('5 bohr');
    expect(facts).toEqual([
      { name: 'scale bar length', value: 5, unit: 'bohr', printed: '5 bohr' },
    ]);
  });

  it('when lengths are in Å, then the bar length is a round number of Å (CODATA 2022 a0 = 0.529 177 Å)', () => {
    const { facts } = build3dOverlay(spec('angstrom'), front);
    // 16.8 mm / (2 mm per bohr / 0.529177 Å per bohr) = 4.445 Å → 2 Å.
    expect(facts[0].printed).toBe('2 Å');
  });

  it('when the raster already draws the bar, then only its label is added, centred above it', () => {
    const { nodes } = build3dOverlay(spec('bohr'), {
      ...front,
      scaleBar: { from: [5, 78], to: [25, 78], lengthBohr: 10 },
    });
    expect(nodesWithRole(nodes, 'scale-bar')).toHaveLength(0);
    const label = textsWithRole(nodes, 'scale-bar-label')[0];
    expect(runsText(label.runs)).toBe('10 bohr');
    expect(label.x).toBe(15);
    expect(
      textsWithRole(nodes, 'orbital-label')[0]
        .runs.map((r) => r.text)
        .join(''),
    ).toBe('3dz²');
  });

  it('when the renderer reports only the nucleus and axis ends, then the linear projection reproduces them', () => {
    const project = linearProjection([40, 45], { x: [60, 50], y: [30, 52], z: [40, 20] }, 10);
    expect(project([10, 0, 0])).toEqual([60, 50]);
    expect(project([0, 10, 0])).toEqual([30, 52]);
    expect(project([0, 0, 10])).toEqual([40, 20]);
    expect(project([5, 5, 5])).toEqual([40 + 10 - 5 + 0, 45 + 2.5 + 3.5 - 12.5]);
  });
});
