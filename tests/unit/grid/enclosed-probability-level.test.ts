// The enclosed-probability level against exact values: 1s from REFERENCE.md §9 (closed form
// c_p = e^(−2 r_p)/π, r_p from the incomplete gamma function), 2p_z from mpmath
// (scripts/fixtures/enclosed-probability-level.py → fixtures/enclosed-probability-level.json).
//
// Tolerance (the level is grid-limited): voxels cut by the surface are counted wholly in or out,
// in symmetric groups of up to 48, giving a random-like level error σ(c)/c ≈ 1.13 h²/r for a
// surface of radius r (derivation in shared/grid/enclosed-probability-level.ts). Tests allow 2σ.
import { describe, expect, it } from 'vitest';
import { enclosedProbabilityLevels } from '../../../shared/grid/enclosed-probability-level';
import { marchingCubes } from '../../../shared/grid/marching-cubes';
import fixture from './fixtures/enclosed-probability-level.json';
import { psi1s, psi2pz, sampleField } from './test-fields';

// REFERENCE.md §9, "Isosurface enclosing probability p", 1s isovalue |ψ|² and radius r_p (a0, Z = 1).
const REFERENCE_1S = [
  { p: 0.5, c: 0.02195434521057258, r: 1.33703015686178 },
  { p: 0.9, c: 0.001553802348981213, r: 2.661160168917105 },
  { p: 0.99, c: 7.115309030325548e-5, r: 4.202973457442733 },
];
const tolerance = (h: number, r: number): number => 2 * 1.13 * (h * h) / r;

function report(label: string, value: number, expected: number, tol: number): string {
  return `${label}: got ${value}, expected ${expected}, relative difference ${((value - expected) / expected).toExponential(3)}, tolerance ${tol.toExponential(3)}`;
}

describe('1s levels against REFERENCE.md §9 on grids of half-width 8 bohr', () => {
  const errors: number[] = [];
  for (const n of [64, 128, 192]) {
    it(`n = ${n}: every level within 2σ of the exact value, enclosed fraction ≥ p`, () => {
      const grid = { n, half: 8 };
      const h = 16 / (n - 1);
      const field = sampleField(grid, psi1s);
      const levels = enclosedProbabilityLevels(field, null, h ** 3, REFERENCE_1S.map((x) => x.p));
      levels.forEach((level, i) => {
        const { p, c, r } = REFERENCE_1S[i];
        const relative = Math.abs(level.densityLevel - c) / c;
        if (p === 0.9) errors.push(relative);
        expect(relative, report(`c_${p}`, level.densityLevel, c, tolerance(h, r))).toBeLessThan(tolerance(h, r));
        expect(level.psiLevel).toBe(Math.sqrt(level.densityLevel));
        // The region overshoots p by less than the samples tied at the level (symmetric grid points
        // at one radius have equal density and go in together).
        const ties = field.filter((v) => v * v === level.densityLevel).length;
        expect(ties).toBeGreaterThanOrEqual(1);
        expect(level.enclosed).toBeGreaterThanOrEqual(p);
        expect(level.enclosed - p).toBeLessThan(ties * level.densityLevel * h ** 3);
      });
      // The box [−8, 8]³ misses the 1s probability beyond it: about 5e-6 (exact 1s tail P(r > 8)
      // = 1.3e-5 is an upper bound); the Riemann sum itself errs by less than 2e-4 at n = 64.
      expect(levels[0].gridTotal).toBeGreaterThan(0.9998);
      expect(levels[0].gridTotal).toBeLessThan(1.00001);
    });
  }
  it('the 90 % level error shrinks on this family: 64³ → 128³ → 192³ (2.3 % → 0.34 % → 0.11 % when written)', () => {
    // Lattice noise makes this family-dependent: on other half-widths 128³ can beat 192³.
    expect(errors).toHaveLength(3);
    expect(errors[1]).toBeLessThan(errors[0]);
    expect(errors[2]).toBeLessThan(errors[1]);
  });
});

describe('the fixture generator agrees with REFERENCE.md §9 (1s, 16 digits)', () => {
  it('reproduces the published isovalues', () => {
    for (const { p, c } of REFERENCE_1S) {
      const row = fixture['1s'].find((x) => x.enclosed === p)!;
      expect(Math.abs(row.densityLevel - c) / c).toBeLessThan(1e-15);
    }
  });
});

describe('2p_z against mpmath (n = 128, half-width 12 bohr)', () => {
  const grid = { n: 128, half: 12 };
  const h = 24 / 127;
  const field = sampleField(grid, psi2pz);
  const exact = fixture['2p_z'].find((x) => x.enclosed === 0.9)!;
  const [level] = enclosedProbabilityLevels(field, null, h ** 3, [0.9]);

  it('finds the 90 % level within 2σ (r taken as half the lobe length, zOuter/2)', () => {
    const tol = tolerance(h, exact.zOuter / 2);
    const relative = Math.abs(level.densityLevel - exact.densityLevel) / exact.densityLevel;
    expect(relative, report('c_0.9 (2p_z)', level.densityLevel, exact.densityLevel, tol)).toBeLessThan(tol);
  });

  it('meshes lobes that reach exactly as far along z as the exact surface does (within h/2)', () => {
    const positive = marchingCubes(field, grid, { isovalue: level.psiLevel });
    const negative = marchingCubes(field, grid, { isovalue: level.psiLevel, sign: -1 });
    let top = -Infinity;
    let bottom = Infinity;
    for (let v = 0; v < positive.vertexCount; v++) top = Math.max(top, positive.positions[3 * v + 2]);
    for (let v = 0; v < negative.vertexCount; v++) bottom = Math.min(bottom, negative.positions[3 * v + 2]);
    expect(Math.abs(top - exact.zOuter)).toBeLessThan(h / 2);
    expect(Math.abs(-bottom - exact.zOuter)).toBeLessThan(h / 2);
  });
});

describe('what the level reports is exactly what the grid holds', () => {
  const grid = { n: 40, half: 7 };
  const h = 14 / 39;
  const re = sampleField(grid, (x, y, z) => psi2pz(x, y, z) + 0.3 * psi1s(x, y, z));
  const im = sampleField(grid, (x, y, z) => 0.5 * psi2pz(y, z, x));

  it('matches a full sort: smallest sample density whose region holds ≥ p, its mass and count', () => {
    const density = Array.from(re, (a, s) => a * a + im[s] * im[s]).sort((a, b) => b - a);
    const total = density.reduce((a, b) => a + b, 0);
    for (const p of [0.3, 0.9, 0.97]) {
      let mass = 0;
      let k = -1;
      while (mass * h ** 3 < p * 0.8) mass += density[++k];
      const [level] = enclosedProbabilityLevels(re, im, h ** 3, [p], 0.8);
      expect(level.densityLevel).toBe(density[k]);
      expect(level.samplesInside).toBe(density.filter((d) => d >= density[k]).length);
      const withTies = density.filter((d) => d >= density[k]).reduce((a, b) => a + b, 0);
      expect(mass).toBeLessThanOrEqual(withTies);
      expect(level.enclosed).toBeCloseTo((withTies * h ** 3) / 0.8, 12);
      expect(level.gridTotal).toBeCloseTo((total * h ** 3) / 0.8, 12);
    }
  });

  it('refuses a fraction the grid cannot hold, naming the extent', () => {
    const small = { n: 30, half: 2 };
    const hs = 4 / 29;
    expect(() => enclosedProbabilityLevels(sampleField(small, psi1s), null, hs ** 3, [0.99])).toThrow(
      /^extent: the grid holds only 0\.\d+ of the probability, less than the 0\.99 asked for/,
    );
  });

  it('refuses bad fractions, voxel volumes and samples, naming each', () => {
    expect(() => enclosedProbabilityLevels(re, im, h ** 3, [1])).toThrow(/^enclosed\[0\]: must lie strictly between 0 and 1/);
    expect(() => enclosedProbabilityLevels(re, im, h ** 3, [0.5, -0.1])).toThrow(/^enclosed\[1\]/);
    expect(() => enclosedProbabilityLevels(re, im, 0, [0.5])).toThrow(/^voxelVolume/);
    expect(() => enclosedProbabilityLevels(re, im.subarray(1), h ** 3, [0.5])).toThrow(/^im/);
    const broken = re.slice();
    broken[77] = NaN;
    expect(() => enclosedProbabilityLevels(broken, null, h ** 3, [0.5])).toThrow(/^field: sample 77 is not a finite number/);
  });
});
