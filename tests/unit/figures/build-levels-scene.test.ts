// Level diagrams print the computed levels and line wavelengths. Check values: REFERENCE.md §3, CODATA 2022
// columns (Hα vacuum 656.469 606 333 nm with the ¹H reduced mass, 656.112 276 419 nm for infinite mass;
// air, Peck & Reeder, 656.288 316 nm from CODATA 2018, the editions differing by ~1e-9 relative) and §2 (E_1).
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { FigureSpecError } from '../../../shared/figures/figure-error';
import { runsText } from '../../../shared/figures/scene';
import { resolved, textsWithRole } from './figure-test-helpers';

function levels(nucleus: 'H-1' | 'infinite', transitions: { upper: number; lower: number }[]) {
  return buildFigureScene(
    resolved({
      schemaVersion: 1,
      system: { Z: 1, nucleus, lengthUnit: 'bohr' },
      state: { terms: [{ n: 1, l: 0, m: 0 }] },
      kind: { type: 'levels', nMax: 5, transitions },
      print: { widthMm: 120, heightMm: 80 },
    }),
  );
}

describe('energy-level diagram scene', () => {
  it('when the nucleus is ¹H, then Hα is labelled with its reduced-mass vacuum wavelength 656.4696 nm and air 656.2883 nm', () => {
    const scene = levels('H-1', [{ upper: 3, lower: 2 }]);
    const rows = textsWithRole(scene, 'key-line').map((t) => runsText(t.runs));
    expect(rows).toEqual(['Hα  3→2  656.4696 nm']);
    expect(textsWithRole(scene, 'key-series').map((t) => runsText(t.runs))).toEqual([
      'Balmer series',
    ]);
    const vac = scene.metadata.facts.find((f) => f.name === 'Balmer Hα vacuum wavelength');
    expect(Math.abs((vac?.value ?? 0) / 656.469606333244 - 1)).toBeLessThan(1e-11);
    const air = scene.metadata.facts.find((f) => f.name === 'Balmer Hα air wavelength');
    expect(Math.abs((air?.value ?? 0) / 656.288316345 - 1)).toBeLessThan(1e-8);
    expect(textsWithRole(scene, 'key-air').map((t) => runsText(t.runs))).toEqual([
      'in air 656.2883 nm',
    ]);
    expect(textsWithRole(scene, 'transition-label').map((t) => runsText(t.runs))).toEqual(['Hα']);
  });

  it('when the nucleus is infinitely heavy, then Hα is 656.1123 nm (REFERENCE §3: 36/(5R∞))', () => {
    const scene = levels('infinite', [{ upper: 3, lower: 2 }]);
    const vac = scene.metadata.facts.find((f) => f.name === 'Balmer Hα vacuum wavelength');
    expect(Math.abs((vac?.value ?? 0) / 656.112276419498 - 1)).toBeLessThan(1e-11);
    expect(vac?.printed).toBe('656.1123 nm');
  });

  it('when levels are drawn, then each carries its energy in eV (REFERENCE §2: E_1 of ¹H = −13.598 eV)', () => {
    const scene = levels('H-1', []);
    const labels = textsWithRole(scene, 'level-label').map((t) => runsText(t.runs));
    expect(labels[0]).toBe('n = 1, \u221213.60 eV');
    expect(labels).toHaveLength(5);
    expect(textsWithRole(scene, 'limit-label').map((t) => runsText(t.runs))).toEqual([
      'n = ∞, 0 eV',
    ]);
  });

  it('when Lyman α is asked for, then no air wavelength is printed and the scene says why', () => {
    const scene = levels('H-1', [{ upper: 2, lower: 1 }]);
    expect(textsWithRole(scene, 'key-air')).toHaveLength(0);
    expect(textsWithRole(scene, 'key-line').map((t) => runsText(t.runs))).toEqual([
      'Lyα  2→1  121.5684 nm',
    ]);
    expect(scene.metadata.notes.some((n) => n.includes('below 200 nm'))).toBe(true);
  });

  it('when a transition goes upward, then the error names the field', () => {
    expect(() => levels('H-1', [{ upper: 2, lower: 3 }])).toThrow(
      new FigureSpecError('kind.transitions[0].upper', 'must be greater than lower = 3, got 2'),
    );
  });

  it("when the ion is not hydrogen, then lines are named by their levels, not by hydrogen's series", () => {
    const scene = buildFigureScene(
      resolved({
        schemaVersion: 1,
        system: { Z: 2, nucleus: 'He-4' },
        state: { terms: [{ n: 1, l: 0, m: 0 }] },
        kind: { type: 'levels', nMax: 4, transitions: [{ upper: 3, lower: 2 }] },
        print: { widthMm: 120, heightMm: 80 },
      }),
    );
    expect(textsWithRole(scene, 'key-series').map((t) => runsText(t.runs))).toEqual([
      'Lines to n = 2',
    ]);
    expect(textsWithRole(scene, 'transition-label').map((t) => runsText(t.runs))).toEqual(['3→2']);
  });
});
