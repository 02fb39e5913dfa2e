// Radial plots print numbers the physics computed, at the right places, with units.
// Check values: REFERENCE.md §8 (2s node at r = 2 a0; most probable radius n² a0 for l = n − 1),
// §2 (E_2 = −1/8 hartree), §8 3s nodes (9 ∓ 3√3)/2 a0 converted with CODATA 2022 a0 = 52.917 721 0544 pm (§1).
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { FigureSpecError } from '../../../shared/figures/figure-error';
import { runsText, type PathNode } from '../../../shared/figures/scene';
import { sceneToSvg } from '../../../shared/figures/scene-to-svg';
import { nodesWithRole, resolved, textsWithRole, xOfValue } from './figure-test-helpers';

const base = { schemaVersion: 1 as const, state: { terms: [{ n: 2, l: 0, m: 0 }] } };

describe('radial plot scene', () => {
  it('when 2s r²R² is drawn, then its radial node is marked at r = 2 bohr and printed "2.00 bohr" (REFERENCE §8)', () => {
    const scene = buildFigureScene(
      resolved({ ...base, kind: { type: 'radial', curves: [{ n: 2, l: 0, quantity: 'r2R2' }] } }),
    );
    const markers = nodesWithRole(scene.children, 'node-marker') as PathNode[];
    expect(markers).toHaveLength(1);
    const first = markers[0].commands[0];
    if (first.op !== 'move') throw new Error('marker starts with a move');
    const centreX = first.x - 0.75;
    expect(centreX).toBeCloseTo(xOfValue(textsWithRole(scene, 'x-tick-label'), 2), 6);
    const fact = scene.metadata.facts.find((f) => f.name === '2s radial node');
    expect(fact?.value).toBeCloseTo(2, 12);
    expect(textsWithRole(scene, 'node-label').map((t) => runsText(t.runs))).toEqual(['2.00 bohr']);
  });

  it('when 2p r²R² is drawn, then the most probable radius is annotated as 4.00 bohr at x = 4 (REFERENCE §8: n² for l = n − 1)', () => {
    const scene = buildFigureScene(
      resolved({ ...base, kind: { type: 'radial', curves: [{ n: 2, l: 1, quantity: 'r2R2' }] } }),
    );
    const label = textsWithRole(scene, 'most-probable-label');
    expect(label).toHaveLength(1);
    expect(runsText(label[0].runs)).toBe('rmp = 4.00 bohr');
    expect(label[0].runs.map((r) => r.shift)).toEqual(['base', 'sub', 'base']);
    const line = nodesWithRole(scene.children, 'most-probable-line')[0] as PathNode;
    const start = line.commands[0];
    if (start.op !== 'move') throw new Error('line starts with a move');
    expect(start.x).toBeCloseTo(xOfValue(textsWithRole(scene, 'x-tick-label'), 4), 6);
    expect(
      scene.metadata.facts.find((f) => f.name === '2p most probable radius')?.value,
    ).toBeCloseTo(4, 12);
  });

  it('when lengths are in pm, then the 3s nodes are printed in pm and R carries pm^−3/2', () => {
    const scene = buildFigureScene(
      resolved({
        ...base,
        system: { lengthUnit: 'pm' },
        kind: { type: 'radial', curves: [{ n: 3, l: 0, quantity: 'R' }] },
      }),
    );
    const a0pm = 52.9177210544; // CODATA 2022 (REFERENCE §1)
    const nodes = scene.metadata.facts.filter((f) => f.name === '3s radial node');
    expect(nodes.map((f) => f.value / a0pm)).toEqual([
      expect.closeTo((9 - 3 * Math.sqrt(3)) / 2, 12),
      expect.closeTo((9 + 3 * Math.sqrt(3)) / 2, 12),
    ]);
    expect(nodes.map((f) => f.printed)).toEqual(['101 pm', '376 pm']);
    const yTitle = runsText(textsWithRole(scene, 'y-title')[0].runs);
    expect(yTitle).toBe('R(r) / 10−3 pm−3/2');
    expect(runsText(textsWithRole(scene, 'x-title')[0].runs)).toBe('r / pm');
  });

  it('when V_eff of 2p is drawn, then its level is labelled −0.125 hartree (REFERENCE §2: −1/8) between the turning points', () => {
    const scene = buildFigureScene(
      resolved({ ...base, kind: { type: 'radial', curves: [{ n: 2, l: 1, quantity: 'veff' }] } }),
    );
    const label = textsWithRole(scene, 'level-label');
    expect(label.map((t) => runsText(t.runs))).toEqual(['2p: \u22120.125 hartree']);
    expect(scene.metadata.facts.find((f) => f.name === '2p energy')?.value).toBe(-0.125);
    expect(nodesWithRole(scene.children, 'level-line')).toHaveLength(1);
  });

  it('when curves of two quantities are asked for, then they get two panels sharing one labelled r axis', () => {
    const scene = buildFigureScene(
      resolved({
        ...base,
        kind: {
          type: 'radial',
          curves: [
            { n: 1, l: 0, quantity: 'R' },
            { n: 1, l: 0, quantity: 'cumulative' },
          ],
        },
      }),
    );
    expect(scene.children.map((g) => ('role' in g ? g.role : ''))).toEqual([
      'panel-R',
      'panel-cumulative',
    ]);
    expect(textsWithRole(scene, 'x-title')).toHaveLength(1);
  });

  it('when a curve has l ≥ n, then the error names the field', () => {
    expect(() =>
      buildFigureScene(
        resolved({ ...base, kind: { type: 'radial', curves: [{ n: 2, l: 2, quantity: 'R' }] } }),
      ),
    ).toThrow(new FigureSpecError('kind.curves[0].l', 'l must be less than n = 2, got 2'));
  });

  it('when built twice, then the SVG is byte-identical', () => {
    const spec = resolved({
      ...base,
      kind: {
        type: 'radial',
        curves: [
          { n: 3, l: 1, quantity: 'R' },
          { n: 3, l: 2, quantity: 'r2R2' },
        ],
      },
    });
    expect(sceneToSvg(buildFigureScene(spec))).toBe(sceneToSvg(buildFigureScene(spec)));
  });
});
