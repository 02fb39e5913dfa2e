// Grid convergence of the radial solver: Numerov's scheme is fourth order in the step h of x = ln r
// (Koonin & Meredith, Computational Physics, §3.1, from memory), so halving h divides the fine-grid
// energy error by about 16 — 2⁴. That holds for the finite well too, whose jump of V the scheme
// corrects for (shared/solver/numerov-shooting.ts); without the correction it would be order 2.
// The exact values are hydrogen's −1/(2n²) (REFERENCE.md §2) and, for the finite well, the root of
// the textbook matching condition k cot(ka) = −κ (found here by bisection).
import { describe, expect, it } from 'vitest';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { solveRadial } from '../../../shared/solver/solve-radial';

function fineErrors(potential: unknown, l: number, k: number, exact: number, steps: number[]): number[] {
  return steps.map((step) => {
    const level = solveRadial({ potential: buildPotential(potential), l, levels: k + 1, step }).levels[k];
    return Math.abs(level.energyFine - exact);
  });
}

/** Observed order log₂(e_h / e_{h/2}) for successive halvings. */
const orders = (errors: number[]): number[] => errors.slice(1).map((e, i) => Math.log2(errors[i] / e));

describe('convergence with the grid step', () => {
  it('when the fine step halves (0.02 → 0.005) for hydrogen 2s, then the error falls at order 4 (within ±0.3)', () => {
    const observed = orders(fineErrors({ type: 'coulomb', Z: 1 }, 0, 1, -0.125, [0.04, 0.02, 0.01]));
    for (const p of observed) expect(Math.abs(p - 4), `orders ${observed.join(', ')}`).toBeLessThan(0.3);
  });

  it('when the step halves for the oscillator 1d level, then the error falls at order 4 (within ±0.3)', () => {
    const observed = orders(fineErrors({ type: 'harmonic-oscillator', omega: 1 }, 2, 0, 3.5, [0.04, 0.02, 0.01]));
    for (const p of observed) expect(Math.abs(p - 4), `orders ${observed.join(', ')}`).toBeLessThan(0.3);
  });

  it('when V jumps (finite well V₀ = 10 hartree, a = 1 bohr), then the order is still 4 and the level within 1e-10 hartree', () => {
    const V0 = 10;
    const match = (E: number) => {
      const k = Math.sqrt(2 * (E + V0));
      return (k * Math.cos(k)) / Math.sin(k) + Math.sqrt(-2 * E);
    };
    // One s level with ka in (π/2, π): bisection on the matching condition.
    let lo = -V0 + (Math.PI / 2) ** 2 / 2 + 1e-12;
    let hi = -V0 + Math.PI ** 2 / 2 - 1e-12;
    for (let i = 0; i < 200; i++) {
      const mid = 0.5 * (lo + hi);
      if (match(mid) * match(lo) > 0) lo = mid;
      else hi = mid;
    }
    const well = { type: 'finite-well', depth: V0, radius: 1 };
    const observed = orders(fineErrors(well, 0, 0, lo, [0.04, 0.02, 0.01]));
    for (const p of observed) expect(Math.abs(p - 4), `orders ${observed.join(', ')}`).toBeLessThan(0.3);
    const sol = solveRadial({ potential: buildPotential(well), l: 0, levels: 1 });
    expect(sol.order).toBe(4);
    expect(Math.abs(sol.levels[0].energy - lo)).toBeLessThan(1e-10);
  });

  it('when the default grid is used, then the reported error of hydrogen 1s is below 1e-10 hartree and the grid ends where the level has fallen by e^−20', () => {
    const sol = solveRadial({ potential: buildPotential({ type: 'coulomb', Z: 1 }), l: 0, levels: 1 });
    expect(sol.levels[0].error).toBeLessThan(1e-10);
    expect(Math.abs(sol.levels[0].u[sol.r.length - 2])).toBeLessThan(1e-8);
  });
});
