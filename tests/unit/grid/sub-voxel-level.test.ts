// The sub-voxel level against the exact 1s levels of REFERENCE.md §9 (c_p = e^(−2 r_p)/π) over a
// family of grids, and against the mpmath 2p_z level (fixtures/enclosed-probability-level.json).
// Tolerance h²/3: the two second-order terms the voxel model leaves, each ≈ h²/6 in the 1s level
// (derivation in shared/grid/sub-voxel-level.ts).
import { describe, expect, it } from 'vitest';
import { enclosedProbabilityLevels } from '../../../shared/grid/enclosed-probability-level';
import { findIsosurfaceLevels } from '../../../shared/grid/find-isosurface-levels';
import fixture from './fixtures/enclosed-probability-level.json';
import { psi1s, psi2pz, sampleField } from './test-fields';

// REFERENCE.md §9, 1s isovalues |ψ|² (a0⁻³, Z = 1).
const REFERENCE_1S = { 0.5: 0.02195434521057258, 0.9: 0.001553802348981213 } as const;
const FRACTIONS = [0.5, 0.9] as const;

function errors(n: number, half: number) {
  const grid = { n, half };
  const field = sampleField(grid, psi1s);
  const sharp = findIsosurfaceLevels(field, null, grid, FRACTIONS);
  const counted = findIsosurfaceLevels(field, null, grid, FRACTIONS, 'samples');
  const relative = (c: number, p: 0.5 | 0.9) => Math.abs(c - REFERENCE_1S[p]) / REFERENCE_1S[p];
  return {
    h: (2 * half) / (n - 1),
    sharp,
    sharpErrors: sharp.map((l, i) => relative(l.densityLevel, FRACTIONS[i])),
    countErrors: counted.map((l, i) => relative(l.densityLevel, FRACTIONS[i])),
  };
}

describe('sub-voxel level, 1s, half-widths 7 and 8 bohr, n = 48 … 128', () => {
  const family = [7, 8].flatMap((half) => [48, 64, 96, 128].map((n) => ({ n, half, ...errors(n, half) })));

  it('is within h²/3 of REFERENCE.md §9 on every grid, for p = 0.5 and 0.9', () => {
    for (const { n, half, h, sharpErrors } of family) {
      sharpErrors.forEach((e, i) =>
        expect(e, `n = ${n}, half = ${half}, p = ${FRACTIONS[i]}: relative error ${e.toExponential(2)}, tolerance ${(h * h / 3).toExponential(2)}`).toBeLessThan((h * h) / 3),
      );
    }
  });

  it('has a worst error over the family at least 4 times smaller than whole-sample counting (1.5 % vs 6.9 % when written)', () => {
    const worst = (key: 'sharpErrors' | 'countErrors') => Math.max(...family.flatMap((f) => f[key]));
    expect(worst('sharpErrors') * 4).toBeLessThan(worst('countErrors'));
  });

  it('encloses exactly the fraction asked for by its own model, and says how much the samples hold', () => {
    for (const { sharp } of family) {
      sharp.forEach((l, i) => {
        expect(l.method).toBe('sub-voxel');
        expect(Math.abs(l.enclosed - FRACTIONS[i])).toBeLessThan(1e-12);
        expect(l.psiLevel).toBe(Math.sqrt(l.densityLevel));
      });
    }
    const grid = { n: 48, half: 7 };
    const field = sampleField(grid, psi1s);
    const h = 14 / 47;
    for (const level of findIsosurfaceLevels(field, null, grid, FRACTIONS)) {
      const held = field.reduce((sum, v) => (v * v >= level.densityLevel ? sum + v * v : sum), 0) * h ** 3;
      // The voxel model keeps |ψ|² in float32 (memory): agreement to float32 rounding.
      expect(Math.abs(level.enclosedBySamples - held) / held).toBeLessThan(1e-7);
    }
  });
});

describe('sub-voxel level convergence, 1s at 90 %', () => {
  it('shrinks from 64³ to 128³ to 192³ on both half-widths (7 and 8 bohr)', () => {
    for (const half of [7, 8]) {
      const e = [64, 128, 192].map((n) => errors(n, half).sharpErrors[1]);
      expect(e[1], `half ${half}: ${e.map((x) => x.toExponential(2)).join(' → ')}`).toBeLessThan(e[0]);
      expect(e[2], `half ${half}: ${e.map((x) => x.toExponential(2)).join(' → ')}`).toBeLessThan(e[1]);
    }
  });
});

describe('sub-voxel level, 2p_z against mpmath (n = 96 and 128, half-width 12 bohr)', () => {
  it('is within h²/3 of the exact 90 % level', () => {
    const exact = fixture['2p_z'].find((x) => x.enclosed === 0.9)!;
    for (const n of [96, 128]) {
      const grid = { n, half: 12 };
      const h = 24 / (n - 1);
      const [level] = findIsosurfaceLevels(sampleField(grid, psi2pz), null, grid, [0.9]);
      const e = Math.abs(level.densityLevel - exact.densityLevel) / exact.densityLevel;
      expect(e, `n = ${n}: ${e.toExponential(2)}`).toBeLessThan((h * h) / 3);
    }
  });
});

describe('the sample count it starts from', () => {
  it('is what "samples" returns, unchanged', () => {
    const grid = { n: 40, half: 7 };
    const field = sampleField(grid, psi2pz);
    const [counted] = findIsosurfaceLevels(field, null, grid, [0.9], 'samples');
    const [direct] = enclosedProbabilityLevels(field, null, (14 / 39) ** 3, [0.9]);
    expect(counted.densityLevel).toBe(direct.densityLevel);
    expect(counted.enclosed).toBe(direct.enclosed);
    expect(counted.method).toBe('samples');
  });
});
