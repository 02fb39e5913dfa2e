// Level diagrams comparing solved levels with hydrogen's. Check values: hydrogen E_n = −Z²/(2n²)
// (REFERENCE.md §2); the Coulomb potential solved numerically must land on them (REFERENCE §10:
// shooting reproduces −1/(2n²) to 13 digits), and a screened core must split 2s below 2p (the
// ordering of alkali valence levels, common knowledge of atomic structure).
import { describe, expect, it } from 'vitest';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { FigureSpecError } from '../../../shared/figures/figure-error';
import type { FigureScene } from '../../../shared/figures/scene';
import type { PotentialSpec } from '../../../shared/spec/figure-spec';
import { resolved, textsWithRole } from './figure-test-helpers';

function compare(potential: PotentialSpec, nMax: number, lMax: number): FigureScene {
  return buildFigureScene(
    resolved({
      schemaVersion: 1,
      state: { terms: [{ n: 1, l: 0, m: 0 }] },
      kind: { type: 'levels', nMax, compare: 'solved-vs-hydrogen', potential, lMax },
      print: { widthMm: 140, heightMm: 100 },
    }),
  );
}

const fact = (scene: FigureScene, name: string) => {
  const f = scene.metadata.facts.find((x) => x.name === name);
  if (!f)
    throw new Error(
      `no fact "${name}" among ${scene.metadata.facts.map((x) => x.name).join(', ')}`,
    );
  return f;
};

describe('solved levels beside hydrogen', () => {
  it('when the core is screened (Z = 3, a = 0.5 bohr), then 2s lies below 2p below 3d… and the levels approach hydrogen from below', () => {
    const scene = compare({ type: 'core-screened', Z: 3, a: 0.5 }, 4, 2);
    const e = (name: string) => fact(scene, `${name} (solved) energy`).value;
    expect(e('2s')).toBeLessThan(e('2p'));
    expect(e('3s')).toBeLessThan(e('3p'));
    expect(e('3p')).toBeLessThan(e('3d'));
    // Every valence level lies below hydrogen's of the same n (the core attracts more than −1/r).
    for (const [name, n] of [
      ['2s', 2],
      ['2p', 2],
      ['3d', 3],
    ] as const)
      expect(e(name)).toBeLessThan(fact(scene, `n = ${n} (hydrogen) energy`).value);
    const labels = textsWithRole(scene, 'solved-label').map((t) =>
      t.runs.map((r) => r.text).join(''),
    );
    expect(labels).toContain(`2s ${fact(scene, '2s (solved) energy').printed.split(' ')[0]}`);
    expect(scene.metadata.notes[0]).toMatch(
      /^Solved numerically \(Numerov shooting on a logarithmic grid/,
    );
  });

  it('when the potential is pure Coulomb, then every solved level prints as hydrogen’s −1/(2n²)', () => {
    const scene = compare({ type: 'coulomb', Z: 1 }, 3, 2);
    for (const [name, n] of [
      ['1s', 1],
      ['2s', 2],
      ['2p', 2],
      ['3s', 3],
      ['3p', 3],
      ['3d', 3],
    ] as const) {
      const solved = fact(scene, `${name} (solved) energy`);
      expect(Math.abs(solved.value + 1 / (2 * n * n)), name).toBeLessThan(1e-10);
      expect(solved.printed).toBe(fact(scene, `n = ${n} (hydrogen) energy`).printed);
    }
  });

  it('when the page is the house style’s 84 mm square, then three columns fit and energies print with four digits', () => {
    const scene = buildFigureScene(
      resolved({
        schemaVersion: 1,
        state: { terms: [{ n: 1, l: 0, m: 0 }] },
        kind: {
          type: 'levels',
          nMax: 4,
          compare: 'solved-vs-hydrogen',
          potential: { type: 'core-screened', Z: 3, a: 0.5 },
        },
      }),
    );
    expect(scene.widthMm).toBe(84);
    expect(fact(scene, '2s (solved) energy').printed).toBe('−0.2010 hartree');
    expect(fact(scene, 'n = 2 (hydrogen) energy').printed).toBe('−0.1250 hartree');
  });

  it('when no potential is given, then the spec is refused naming kind.potential', () => {
    const spec = resolved({
      schemaVersion: 1,
      state: { terms: [{ n: 1, l: 0, m: 0 }] },
      kind: { type: 'levels' },
    });
    const bad = { ...spec, kind: { ...spec.kind, compare: 'solved-vs-hydrogen' as const } };
    expect(() => buildFigureScene(bad)).toThrow(FigureSpecError);
    expect(() => buildFigureScene(bad)).toThrow(/^kind\.potential:/);
  });
});
