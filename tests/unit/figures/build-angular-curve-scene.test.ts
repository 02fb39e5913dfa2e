// Angular curves: lobe sizes and nodal directions from the spherical harmonics of REFERENCE.md §5
// (p_z = √(3/4π) cos θ, largest |Y| 0.488 602 511 902 9199; d_z² ∝ 3cos²θ − 1, nodes at cos²θ = 1/3).
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import type { PathNode } from '../../../shared/figures/scene';
import { runsText } from '../../../shared/figures/scene';
import { nodesWithRole, resolved, textsWithRole } from './figure-test-helpers';

function angular(
  term: { n: number; l: number; m: number; basis?: 'real' | 'complex' },
  quantity: 'real' | 'abs' = 'real',
) {
  return resolved({
    schemaVersion: 1,
    state: { terms: [term] },
    kind: { type: 'angular', mode: 'curve', quantity, plane: 'xz' },
    look: { showNodalSurfaces: true },
    print: { widthMm: 84, heightMm: 84 },
  });
}

function points(p: PathNode): [number, number][] {
  return p.commands.flatMap((c) =>
    c.op === 'move' || c.op === 'line' ? [[c.x, c.y] as [number, number]] : [],
  );
}

describe('angular curve scene', () => {
  it('when 2p_z is drawn in the xz-plane, then the positive lobe points up and reaches |Y| = 0.4886 on the printed scale', () => {
    const scene = buildFigureScene(angular({ n: 2, l: 1, m: 0 }));
    const positive = nodesWithRole(scene.children, 'lobe-positive') as PathNode[];
    const negative = nodesWithRole(scene.children, 'lobe-negative') as PathNode[];
    expect([positive.length, negative.length]).toEqual([1, 1]);
    const axis = nodesWithRole(scene.children, 'axis')[0] as PathNode;
    const cy = points(axis)[0][1];
    const cx = (points(axis)[0][0] + points(axis)[1][0]) / 2;
    const far = Math.max(...points(positive[0]).map(([x, y]) => Math.hypot(x - cx, y - cy)));
    const top = points(positive[0]).reduce((a, b) => (b[1] < a[1] ? b : a));
    expect(top[1]).toBeLessThan(cy);
    // Scale: the outermost dashed circle's radius belongs to the largest printed scale value.
    const circles = nodesWithRole(scene.children, 'scale-circle') as PathNode[];
    const outer = circles[circles.length - 1].commands[0];
    if (outer.op !== 'move') throw new Error('circle starts with a move');
    const labels = textsWithRole(scene, 'scale-label').map((t) => Number(runsText(t.runs)));
    const mmPerUnit = (outer.x - cx) / labels[labels.length - 1];
    expect(far / mmPerUnit).toBeCloseTo(0.4886025119029199, 4);
  });

  it('when d_z² is drawn with nodal lines, then they lie at θ = arccos(1/√3) = 54.74° from z', () => {
    const scene = buildFigureScene(angular({ n: 3, l: 2, m: 0 }));
    const lines = nodesWithRole(scene.children, 'nodal-line') as PathNode[];
    expect(lines).toHaveLength(2);
    for (const line of lines) {
      const [[x1, y1], [x2, y2]] = points(line);
      const fromZ = (Math.atan2(Math.abs(x2 - x1), Math.abs(y2 - y1)) * 180) / Math.PI;
      expect(fromZ).toBeCloseTo((Math.acos(1 / Math.sqrt(3)) * 180) / Math.PI, 6);
    }
    expect(nodesWithRole(scene.children, 'lobe-positive')).toHaveLength(2);
    expect(nodesWithRole(scene.children, 'lobe-negative')).toHaveLength(2);
  });

  it('when a complex orbital is drawn as "abs", then one lobe outline in the positive colour; as "real" it is refused with the field named', () => {
    const term = { n: 2, l: 1, m: 1, basis: 'complex' as const };
    const scene = buildFigureScene(angular(term, 'abs'));
    expect(nodesWithRole(scene.children, 'lobe-positive')).toHaveLength(1);
    expect(() => buildFigureScene(angular(term, 'real'))).toThrow(/^kind\.quantity:/);
  });
});
