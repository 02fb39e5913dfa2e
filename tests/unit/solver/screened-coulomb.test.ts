// Screened Coulomb (Yukawa) and finite-size nucleus on the default grid.
// Sources: REFERENCE.md §10.5 (critical screening computed there by two independent methods; Rogers,
// Graboske & Harwood, Phys. Rev. A 1, 1577 (1970), from memory) and §12 item 6 (1s energies at
// λ = 0.5 and 1.0, computed there). The critical λ is found here by bisection on λ where the
// zero-energy count of bound levels drops; the default grid's O(h⁴) error in λ_c was measured at
// 7e-11 (1s) and below 5e-11 for 2s, 2p, 3d, so the tests allow 3e-10 relative (the table gives 10 digits).
import { describe, expect, it } from 'vitest';
import { countBoundLevels } from '../../../shared/solver/count-bound-levels';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { DEFAULT_STEP, solveRadial } from '../../../shared/solver/solve-radial';
import { expectClose } from '../physics/close-to';

const yukawa = (lambda: number, Z = 1) => buildPotential({ type: 'yukawa', Z, lambda });

/** λ where the (k+1)-th level of this l stops being bound, by bisection on the level count. */
function criticalScreening(l: number, k: number, lo: number, hi: number): number {
  for (let i = 0; i < 50; i++) {
    const mid = 0.5 * (lo + hi);
    if (countBoundLevels(yukawa(mid), l, 1, DEFAULT_STEP / 2) > k) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('Yukawa critical screening (REFERENCE.md §10.5)', () => {
  it('when λ is bisected where the 1s level vanishes, then λ_c = 1.190612421 Z/a0 within 3e-10 relative', () => {
    expectClose(criticalScreening(0, 0, 1, 1.5), 1.190612421, { rel: 3e-10 }, '1s');
  });

  it('when the same is done for 2s, 2p and 3d, then λ_c matches 0.3102092827, 0.2202168066, 0.09134512077', () => {
    expectClose(criticalScreening(0, 1, 0.25, 0.4), 0.3102092827, { rel: 3e-10 }, '2s');
    expectClose(criticalScreening(1, 0, 0.15, 0.3), 0.2202168066, { rel: 3e-10 }, '2p');
    expectClose(criticalScreening(2, 0, 0.05, 0.12), 0.09134512077, { rel: 3e-10 }, '3d');
  });

  it('when λ is just above λ_c(1s), then a solve for l = 0 is refused naming l; just below, the 1s level is bound and shallow', () => {
    expect(() => solveRadial({ potential: yukawa(1.2), l: 0, levels: 1 })).toThrow(/^l: the potential binds no level with l = 0/);
    const [level] = solveRadial({ potential: yukawa(1.18), l: 0, levels: 1 }).levels;
    expect(level.energy).toBeLessThan(0);
    expect(level.energy).toBeGreaterThan(-1e-3);
  });
});

describe('Yukawa energies (REFERENCE.md §12 item 6, computed there, 8.5–11 digits)', () => {
  it('when λ = 0.5 and 1.0, then E_1s = −0.148117022 and −0.01028579 hartree', () => {
    expectClose(solveRadial({ potential: yukawa(0.5), l: 0, levels: 1 }).levels[0].energy, -0.148117022, { abs: 1e-9 });
    expectClose(solveRadial({ potential: yukawa(1.0), l: 0, levels: 1 }).levels[0].energy, -0.01028579, { abs: 1e-8 });
  });

  it('when Z = 2, then E(Z, λ) = Z² E(1, λ/Z) (REFERENCE.md §10.5 scaling)', () => {
    const one = solveRadial({ potential: yukawa(0.1), l: 1, levels: 2 }).levels;
    const two = solveRadial({ potential: yukawa(0.2, 2), l: 1, levels: 2 }).levels;
    for (let k = 0; k < 2; k++) expectClose(two[k].energy, 4 * one[k].energy, { rel: 1e-10 }, { k });
  });

  it('when λ = 0, then the levels are hydrogen’s and the comparison shift vanishes', () => {
    for (const level of solveRadial({ potential: yukawa(0), l: 0, levels: 3 }).levels) {
      expectClose(level.hydrogen!.shift, 0, { abs: 1e-10 }, { n: level.n });
      expectClose(level.hydrogen!.quantumDefect!, 0, { abs: 1e-8 }, { n: level.n });
    }
  });

  it('when λ > 0, then every level lies above hydrogen’s (screening only raises V)', () => {
    for (const level of solveRadial({ potential: yukawa(0.1), l: 1, levels: 2 }).levels)
      expect(level.hydrogen!.shift).toBeGreaterThan(0);
  });
});

describe('finite-size nucleus', () => {
  it('when R = 0.01 bohr, then the 1s shift is (2/5)Z⁴R² to first order (first-order perturbation theory, textbook result)', () => {
    // The next order is smaller by about Z R, so 2 % covers it.
    const [level] = solveRadial({ potential: buildPotential({ type: 'finite-nucleus', Z: 1, radius: 0.01 }), l: 0, levels: 1 }).levels;
    expectClose(level.hydrogen!.shift, 0.4 * 1e-4, { rel: 0.02 });
  });

  it('when R is tiny, then the levels approach hydrogen’s and p levels barely move', () => {
    const p = solveRadial({ potential: buildPotential({ type: 'finite-nucleus', Z: 1, radius: 1e-3 }), l: 1, levels: 1 }).levels[0];
    expectClose(p.energy, -0.125, { abs: 1e-10 });
  });
});
