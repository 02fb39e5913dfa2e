// Radial plots drawing uploaded data beside computed curves. Check value: R_10(r) = 2e^(−r) in
// bohr^(−3/2) for hydrogen (REFERENCE.md §8, R_nl with n = 1, l = 0, Z = 1), so data tabulated from
// that formula must land on the computed 1s curve.
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import type { FigureDatasets } from '../../../shared/figures/radial-datasets';
import { runsText, type PathNode } from '../../../shared/figures/scene';
import { nodesWithRole, resolved, textsWithRole } from './figure-test-helpers';

const spec = (datasets: { id: number; label?: string }[], quantity: 'R' | 'veff' = 'R') =>
  resolved({
    schemaVersion: 1,
    state: { terms: [{ n: 1, l: 0, m: 0 }] },
    kind: { type: 'radial', curves: [{ n: 1, l: 0, quantity }], rMax: 6, datasets },
  });

const rs = Array.from({ length: 13 }, (_, i) => i * 0.5);
const data: FigureDatasets = {
  7: { quantity: 'R', r: rs, values: rs.map((r) => 2 * Math.exp(-r)), label: 'Tabulated 1s' },
  9: { quantity: 'potential', r: [0.5, 1, 2, 4], values: [-2, -1, -0.5, -0.25], label: 'Coulomb table' },
};

const vertices = (paths: PathNode[]) =>
  paths.flatMap((p) => p.commands.flatMap((c) => (c.op === 'move' || c.op === 'line' ? [[c.x, c.y] as const] : [])));

/** y of a polyline at page x, by linear interpolation between its vertices. */
function yAt(line: readonly (readonly [number, number])[], x: number): number {
  for (let i = 1; i < line.length; i++) {
    const [x0, y0] = line[i - 1];
    const [x1, y1] = line[i];
    if (x >= x0 && x <= x1) return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
  }
  return Number.NaN;
}

describe('radial plot with data sets', () => {
  it('when data of R_10 = 2e^(−r) are drawn beside the computed 1s curve, then every point lies on the curve (within 0.01 mm) and is marked', () => {
    const scene = buildFigureScene(spec([{ id: 7 }]), data);
    const curve = vertices(nodesWithRole(scene.children, 'curve') as PathNode[]);
    const points = nodesWithRole(scene.children, 'data-point') as PathNode[];
    expect(points).toHaveLength(rs.length);
    const line = vertices(nodesWithRole(scene.children, 'data-curve') as PathNode[]);
    expect(line).toHaveLength(rs.length);
    for (const [x, y] of line) expect(Math.abs(yAt(curve, x) - y)).toBeLessThan(0.01);
    expect(textsWithRole(scene, 'legend-label').map((t) => runsText(t.runs))).toContain('Tabulated 1s');
    expect(scene.metadata.altText).toContain('radial function R(r) of 1s, data "Tabulated 1s"');
    expect(scene.metadata.notes).toEqual([]);
  });

  it('when the spec gives a label, then the legend shows it instead of the data set name', () => {
    const scene = buildFigureScene(spec([{ id: 7, label: 'HF 1s' }]), data);
    const labels = textsWithRole(scene, 'legend-label').map((t) => runsText(t.runs));
    expect(labels).toContain('HF 1s');
    expect(labels).not.toContain('Tabulated 1s');
  });

  it('when a potential is uploaded beside an R curve, then it gets a V_eff panel of its own', () => {
    const scene = buildFigureScene(spec([{ id: 7 }, { id: 9 }]), data);
    const panels = scene.children.filter((n) => n.type === 'group').map((n) => n.role);
    expect(panels).toEqual(['panel-R', 'panel-veff']);
    // Uploaded potentials alone: the axis is called V (the data need not include l(l+1)/2r²).
    const veff = scene.children.find((n) => n.type === 'group' && n.role === 'panel-veff');
    const titles = textsWithRole(veff && veff.type === 'group' ? veff.children : [], 'y-title');
    expect(titles.map((t) => runsText(t.runs))).toEqual(['V / hartree']);
  });

  it('when a named data set is not given, then nothing is drawn for it and a note says so', () => {
    const scene = buildFigureScene(spec([{ id: 7 }, { id: 12 }]), { 7: data[7] });
    expect(nodesWithRole(scene.children, 'data-curve')).toHaveLength(1);
    expect(scene.metadata.notes).toEqual(['Data set 12 is not in this project, so it is not drawn.']);
    const none = buildFigureScene(spec([{ id: 7 }]));
    expect(nodesWithRole(none.children, 'data-curve')).toHaveLength(0);
    expect(none.metadata.notes).toEqual(['Data set 7 is not in this project, so it is not drawn.']);
  });
});
