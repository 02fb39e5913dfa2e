// Radial solver against exactly solvable potentials (REFERENCE.md §7, §10.1–§10.4) on the default grid.
// Tolerances: the solver's Richardson-extrapolated energies were measured within 1.5e-12 hartree of
// hydrogen's and within 3e-11 relative of the other exact levels; the tests allow 1e-10 hartree for
// hydrogen (the brief asks 1e-8) and 1e-9 relative elsewhere, and check that the reported error
// estimate covers the fine-grid energy's true error within a factor 5.
import { describe, expect, it } from 'vitest';
import { radialFunction } from '../../../shared/physics/radial-function';
import { buildPotential } from '../../../shared/solver/potentials/build-potential';
import { solveRadial, type SolvedLevel } from '../../../shared/solver/solve-radial';
import { expectClose } from '../physics/close-to';

function solve(potential: unknown, l: number, levels: number): SolvedLevel[] {
  return solveRadial({ potential: buildPotential(potential), l, levels }).levels;
}

/** Energy within `rel` of the exact value, and the error estimate honest for the fine grid. */
function expectLevel(level: SolvedLevel, exact: number, tol: { rel?: number; abs?: number }, input: unknown): void {
  expectClose(level.energy, exact, tol, input);
  expect(level.nodes, `nodes of ${JSON.stringify(input)}`).toBe(level.n - level.l - 1);
  const fineError = Math.abs(level.energyFine - exact);
  expect(fineError, `fine-grid error vs estimate for ${JSON.stringify(input)}`).toBeLessThanOrEqual(
    5 * level.error + 1e-12 * Math.abs(exact),
  );
}

describe('hydrogen-like Coulomb potential (E_n = −Z²/(2n²), REFERENCE.md §2; ⟨r⟩, §7)', () => {
  it('when Z = 1 and l = 0…3, then the five lowest levels are within 1e-10 hartree and ⟨r⟩ = (3n² − l(l+1))/2', () => {
    for (let l = 0; l <= 3; l++) {
      const levels = solve({ type: 'coulomb', Z: 1 }, l, 5);
      for (const level of levels) {
        const { n } = level;
        expectLevel(level, -0.5 / (n * n), { abs: 1e-10 }, { Z: 1, n, l });
        expectClose(level.rMean, (3 * n * n - l * (l + 1)) / 2, { rel: 1e-8 }, { Z: 1, n, l, rMean: true });
        expect(level.hydrogen?.shift).toBe(level.energy - level.hydrogen!.energy);
      }
    }
  });

  it('when Z = 3, then E_n = −9/(2n²) within 1e-9 hartree (the error scales as Z²)', () => {
    for (const level of solve({ type: 'coulomb', Z: 3 }, 1, 3))
      expectLevel(level, -4.5 / level.n ** 2, { abs: 1e-9 }, { Z: 3, n: level.n, l: 1 });
  });

  it('when the reduced mass of ¹H is used, then E_n = −μ/(2n²) and ⟨r⟩ scales by 1/μ', () => {
    const mu = 0.9994556794247615; // μ/m_e of ¹H, CODATA 2022 (REFERENCE.md §1)
    const sol = solveRadial({ potential: buildPotential({ type: 'coulomb', Z: 1 }), l: 1, levels: 2, muRatio: mu });
    for (const level of sol.levels) {
      expectLevel(level, -mu / (2 * level.n ** 2), { abs: 1e-10 }, { mu, n: level.n });
      expectClose(level.rMean, (3 * level.n ** 2 - 2) / (2 * mu), { rel: 1e-8 }, { mu, n: level.n });
    }
  });

  it('when the radial functions are compared with shared/physics radialFunction, then they agree within 1e-8 of max |R|', () => {
    for (const [l, count] of [[0, 3], [1, 3], [2, 2]]) {
      const sol = solveRadial({ potential: buildPotential({ type: 'coulomb', Z: 1 }), l, levels: count });
      for (const level of sol.levels) {
        let peak = 0;
        for (let i = 0; i < sol.r.length; i++) peak = Math.max(peak, Math.abs(radialFunction(level.n, l, sol.r[i])));
        for (let i = 0; i < sol.r.length; i += 7) {
          expectClose(level.R[i], radialFunction(level.n, l, sol.r[i]), { abs: 1e-8 * peak }, { n: level.n, l, r: sol.r[i] });
        }
        // ∫u² dr = ∫u² r dx on the equal steps of x = ln r (trapezoid; both ends are negligible).
        let norm = 0;
        for (let i = 0; i < sol.r.length; i++) norm += level.u[i] ** 2 * sol.r[i] * sol.grid.step;
        expectClose(norm, 1, { abs: 1e-12 }, { n: level.n, l, norm: true });
      }
    }
  });
});

describe('3-D isotropic harmonic oscillator (E = (2n_r + l + 3/2)ω, REFERENCE.md §10.1)', () => {
  it('when ω = 1 and l = 0…3, then n_r = 0…2 are within 1e-9 relative', () => {
    for (let l = 0; l <= 3; l++)
      for (const level of solve({ type: 'harmonic-oscillator', omega: 1 }, l, 3))
        expectLevel(level, 2 * (level.n - l - 1) + l + 1.5, { rel: 1e-9 }, { omega: 1, n: level.n, l });
  });

  it('when ω = 1, then the ground state has ⟨r⟩ = 2/√π (Gaussian u ∝ r e^{−r²/2}, textbook integral)', () => {
    const [level] = solve({ type: 'harmonic-oscillator', omega: 1 }, 0, 1);
    expectClose(level.rMean, 2 / Math.sqrt(Math.PI), { rel: 1e-9 });
  });

  it('when ω = 2.5, then E scales with ω', () => {
    const [level] = solve({ type: 'harmonic-oscillator', omega: 2.5 }, 2, 1);
    expectLevel(level, 2.5 * 3.5, { rel: 1e-9 }, { omega: 2.5, l: 2 });
  });
});

describe('infinite spherical well (E = x_{l,k}²/(2R²), zeros of j_l: A&S Table 10.6 from memory, confirmed by mpmath; REFERENCE.md §10.2)', () => {
  const zeros = [
    [Math.PI, 2 * Math.PI, 3 * Math.PI],
    [4.493409457909064, 7.725251836937707, 10.9041216594289],
    [5.76345919689455, 9.095011330476355, 12.32294097056658],
  ];
  it('when R = 1 bohr and l = 0…2, then the three lowest levels are within 1e-9 relative', () => {
    for (let l = 0; l <= 2; l++)
      for (const level of solve({ type: 'infinite-well', radius: 1 }, l, 3))
        expectLevel(level, zeros[l][level.nodes] ** 2 / 2, { rel: 1e-9 }, { R: 1, n: level.n, l });
  });

  it('when R = 1 bohr, then the s ground state u = √2 sin(πr) has ⟨r⟩ = 1/2 and the right shape', () => {
    const sol = solveRadial({ potential: buildPotential({ type: 'infinite-well', radius: 1 }), l: 0, levels: 1 });
    expectClose(sol.levels[0].rMean, 0.5, { rel: 1e-9 });
    for (let i = 0; i < sol.r.length; i += 13)
      expectClose(sol.levels[0].u[i], Math.SQRT2 * Math.sin(Math.PI * sol.r[i]), { abs: 1e-8 }, { r: sol.r[i] });
  });

  it('when R = 2 bohr, then E scales as 1/R² and u vanishes at the wall', () => {
    const sol = solveRadial({ potential: buildPotential({ type: 'infinite-well', radius: 2 }), l: 1, levels: 1 });
    expectLevel(sol.levels[0], zeros[1][0] ** 2 / 8, { rel: 1e-9 }, { R: 2, l: 1 });
    expect(sol.r[sol.r.length - 1]).toBe(2);
    expect(sol.levels[0].u[sol.r.length - 1]).toBe(0);
  });
});

describe('linear potential V = F r, l = 0 (E = (F²/2)^{1/3}(−a_k), Airy zeros: A&S Table 10.13 from memory; REFERENCE.md §10.3)', () => {
  it('when F = 1, then the three lowest s levels are within 1e-9 relative', () => {
    const expected = [1.855757081489238, 3.24460762400316, 4.38167123928613];
    for (const level of solve({ type: 'linear', F: 1 }, 0, 3))
      expectLevel(level, expected[level.nodes], { rel: 1e-9 }, { F: 1, n: level.n });
  });
});

describe('Hulthén potential, s levels (E_n = −½(Z/n − nδ/2)², Hulthén 1942 from memory; REFERENCE.md §10.4)', () => {
  it('when δ = 0.05, 0.1, 0.2 and 0.4, then every bound s level of the table is within 1e-10 hartree', () => {
    for (const [delta, count] of [[0.05, 3], [0.1, 3], [0.2, 3], [0.4, 2]]) {
      for (const level of solve({ type: 'hulthen', Z: 1, delta }, 0, count)) {
        const n = level.n;
        expectLevel(level, -0.5 * (1 / n - (n * delta) / 2) ** 2, { abs: 1e-10 }, { delta, n });
      }
    }
  });

  it('when δ = 0.4, then a third s level is refused with the field "levels"', () => {
    expect(() => solve({ type: 'hulthen', Z: 1, delta: 0.4 }, 0, 3)).toThrow(
      /^levels: the potential binds only 2 levels with l = 0; level n = 3, l = 0/,
    );
  });

  it('when δ = 0.2, then the 1s function is u = e^{−κr}(1 − e^{−δr}), κ = Z − δ/2, normalised', () => {
    const sol = solveRadial({ potential: buildPotential({ type: 'hulthen', Z: 1, delta: 0.2 }), l: 0, levels: 1 });
    const kappa = 0.9;
    const delta = 0.2;
    // ∫ e^{−2κr}(1 − e^{−δr})² dr = 1/(2κ) − 2/(2κ + δ) + 1/(2κ + 2δ)
    const c = 1 / Math.sqrt(1 / (2 * kappa) - 2 / (2 * kappa + delta) + 1 / (2 * kappa + 2 * delta));
    for (let i = 0; i < sol.r.length; i += 11) {
      const r = sol.r[i];
      expectClose(sol.levels[0].u[i], c * Math.exp(-kappa * r) * -Math.expm1(-delta * r), { abs: 1e-8 }, { r });
    }
  });
});
