// Solved radial curves in the radial plot. Check values: the closed forms of REFERENCE.md §4
// (Griffiths 2nd ed. Table 4.7, from memory): R_20 = (1/√2)(1 − r/2)e^(−r/2), R_21 = r e^(−r/2)/(2√6),
// R_30 = (2/√27)(1 − 2r/3 + 2r²/27)e^(−r/3) for Z = 1, r in bohr; 2s node at r = 2, 3s nodes at
// (9 ∓ 3√3)/2; most probable radius of 2p at 4 bohr (maximum of r⁴e^(−r)).
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { FigureSpecError } from '../../../shared/figures/figure-error';
import { runsText, type FigureScene, type PathNode } from '../../../shared/figures/scene';
import { solvedRadialCurve } from '../../../shared/figures/solved-radial-curve';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { solveRadial } from '../../../shared/solver/solve-radial';
import type { FigureSpecInput } from '../../../shared/spec/figure-spec';
import { nodesWithRole, resolved, textsWithRole } from './figure-test-helpers';

type RadialInput = Extract<FigureSpecInput['kind'], { type: 'radial' }>;

function plot(kind: Omit<RadialInput, 'type'>): FigureScene {
  return buildFigureScene(
    resolved({
      schemaVersion: 1,
      state: { terms: [{ n: 2, l: 0, m: 0 }] },
      kind: { type: 'radial', ...kind },
      print: { widthMm: 120, heightMm: 90 },
    }),
  );
}

const closedForm: Record<string, (r: number) => number> = {
  '2,0': (r) => (1 / Math.SQRT2) * (1 - r / 2) * Math.exp(-r / 2),
  '2,1': (r) => (r * Math.exp(-r / 2)) / (2 * Math.sqrt(6)),
  '3,0': (r) => (2 / Math.sqrt(27)) * (1 - (2 * r) / 3 + (2 * r * r) / 27) * Math.exp(-r / 3),
};

describe('solved radial curves', () => {
  it('when the potential is pure Coulomb, then solved R_nl equals the closed forms of REFERENCE §4 to 1e-7 of its peak', () => {
    const coulomb = buildPotential({ type: 'coulomb', Z: 1 });
    for (const [key, exact] of Object.entries(closedForm)) {
      const [n, l] = key.split(',').map(Number);
      const solution = solveRadial({ potential: coulomb, l, levels: n - l });
      const curve = solvedRadialCurve(solution, n, 'kind.curves[0].n');
      let worst = 0;
      let peak = 0;
      for (let r = 0.05; r < 30; r += 0.05) {
        worst = Math.max(worst, Math.abs(curve.R(r) - exact(r)));
        peak = Math.max(peak, Math.abs(exact(r)));
      }
      expect(worst / peak, `R_${n}${l}: worst ${worst}`).toBeLessThan(1e-7);
    }
  });

  it('when solved and hydrogen 3s are drawn together for pure Coulomb, then the two printed curves coincide within 0.001 mm', () => {
    const scene = plot({
      curves: [
        { n: 3, l: 0, quantity: 'R' },
        { n: 3, l: 0, quantity: 'R', source: 'solved' },
      ],
      potential: { type: 'coulomb', Z: 1 },
      rMax: 25,
    });
    const [hydrogen, solved] = nodesWithRole(scene.children, 'curve') as PathNode[];
    expect(solved.commands.length).toBe(hydrogen.commands.length);
    let worst = 0;
    hydrogen.commands.forEach((c, i) => {
      const d = solved.commands[i];
      if ('y' in c && 'y' in d) worst = Math.max(worst, Math.abs(c.y - d.y), Math.abs(c.x - d.x));
    });
    expect(worst).toBeLessThan(0.001);
    const legend = textsWithRole(scene, 'legend-label').map((t) => runsText(t.runs));
    expect(legend).toEqual(['3s (hydrogen)', '3s (solved)']);
    // Both node markers print the exact nodes (9 ∓ 3√3)/2 = 1.90, 7.10 bohr.
    const facts = scene.metadata.facts
      .filter((f) => f.name === '3s (solved) radial node')
      .map((f) => f.printed);
    expect(facts).toEqual(['1.90 bohr', '7.10 bohr']);
  });

  it('when 2p is solved for pure Coulomb, then r²R² peaks at the printed most probable radius 4.00 bohr', () => {
    const scene = plot({
      curves: [{ n: 2, l: 1, quantity: 'r2R2', source: 'solved' }],
      potential: { type: 'coulomb', Z: 1 },
    });
    const rmp = scene.metadata.facts.find((f) => f.name === '2p (solved) most probable radius');
    expect(rmp?.printed).toBe('4.00 bohr');
    expect(Math.abs((rmp?.value ?? 0) - 4)).toBeLessThan(1e-4);
    expect(scene.metadata.notes.some((n) => n.startsWith('Solved numerically'))).toBe(true);
  });

  it('when the cumulative probability is solved, then it reaches 1 and is 1 − e^(−2r)(1 + 2r + 2r²) within 1e-5 for 1s (REFERENCE §4, integrated)', () => {
    const solution = solveRadial({
      potential: buildPotential({ type: 'coulomb', Z: 1 }),
      l: 0,
      levels: 1,
    });
    const curve = solvedRadialCurve(solution, 1, 'n');
    for (const r of [0.5, 1, 2, 4]) {
      const exact = 1 - Math.exp(-2 * r) * (1 + 2 * r + 2 * r * r);
      // Trapezoidal sum on a grid of 0.5 % steps: second order, ~1e-5 at worst.
      expect(Math.abs(curve.cumulative(r) - exact), `r = ${r}`).toBeLessThan(1e-5);
    }
    expect(curve.cumulative(1e4)).toBe(1);
  });

  it('when a solved state is not bound, then the figure is refused naming the curve', () => {
    expect(() =>
      plot({
        curves: [{ n: 3, l: 2, quantity: 'R', source: 'solved' }],
        potential: { type: 'yukawa', Z: 1, lambda: 0.2 },
      }),
    ).toThrow(/^kind\.curves\[0\]\.l: the potential binds no level with l = 2/);
    expect(() =>
      plot({
        curves: [{ n: 2, l: 0, quantity: 'veff', source: 'solved' }],
        potential: { type: 'coulomb', Z: 1 },
      }),
    ).toThrow(FigureSpecError);
  });
});
