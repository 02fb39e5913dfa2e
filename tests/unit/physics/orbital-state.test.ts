// States: ψ at a test point (REFERENCE.md §6), normalisation, basis mixing, time phase, the grid sampler, hybrids.
import { describe, expect, it } from 'vitest';
import {
  compileState,
  evaluatePsi,
  type Complex,
  type OrbitalState,
} from '../../../shared/physics/orbital-state';
import { sampleStateOnGrid, suggestedExtent } from '../../../shared/physics/sample-state-on-grid';
import { radialFunction } from '../../../shared/physics/radial-function';
import { sphericalHarmonic } from '../../../shared/physics/spherical-harmonic';
import { realHarmonicAtPoint } from '../../../shared/physics/solid-harmonic';
import { radiusEnclosingProbability } from '../../../shared/physics/radius-enclosing-probability';
import { sp2Hybrids, sp3Hybrids, spHybrids } from '../../../shared/physics/hybrid-orbitals';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { NUCLEAR_MASSES, massRatioForNucleus } from '../../../shared/physics/reduced-mass';
import { cartesianToSpherical, gridIndex } from '../../../shared/physics/coordinates';
import { gaussLegendre } from '../../../shared/physics/gauss-legendre';
import { expectClose } from './close-to';

const psiAt = (state: OrbitalState, x: number, y: number, z: number): Complex =>
  evaluatePsi(compileState(state), x, y, z, { re: 0, im: 0 });
const single = (n: number, l: number, m: number, basis: 'real' | 'complex'): OrbitalState => ({
  Z: 1,
  terms: [{ n, l, m, basis }],
});

describe('evaluatePsi at (1, 2, 3) bohr (REFERENCE.md §6, computed there by two routes)', () => {
  it('when a real orbital is asked for, then ψ matches the table', () => {
    const table: [number, number, number, number][] = [
      [1, 0, 0, 0.01337962395481055],
      [2, 0, 0, -0.02674990367152649],
      [2, 1, 1, 0.01535887820111114],
      [2, 1, -1, 0.03071775640222229],
      [2, 1, 0, 0.04607663460333343],
      [3, 0, 0, -0.01426855900639899],
      [3, 1, 0, 0.01917369176164537],
      [3, 2, 0, 0.010620559258552],
      [3, 2, -2, 0.005660107150956343],
      [3, 2, 2, -0.004245080363217257],
      [4, 0, 0, -0.009107119067919625],
      [4, 1, 1, 0.003706599022128455],
      [4, 2, -1, 0.01237067316974046],
      [4, 3, 0, 2.900788536615551e-4],
      [4, 3, -2, 0.001497960759090855],
      [4, 3, -3, -1.019233198467987e-4],
    ];
    for (const [n, l, m, value] of table) {
      const psi = psiAt(single(n, l, m, 'real'), 1, 2, 3);
      expectClose(psi.re, value, { rel: 1e-13 }, { n, l, m });
      expect(psi.im).toBe(0);
    }
  });

  it('when a complex orbital is asked for, then ψ_211, ψ_322 and ψ_43,−3 match', () => {
    const table: [number, number, number, number, number][] = [
      [2, 1, 1, -0.01086036692742393, -0.02172073385484786],
      [3, 2, 2, -0.003001725111512775, 0.0040023001486837],
      [4, 3, -3, -3.963886884359422e-4, 7.207067062471676e-5],
    ];
    for (const [n, l, m, re, im] of table) {
      const c = compileState(single(n, l, m, 'complex'));
      expect(c.isReal).toBe(false);
      const psi = evaluatePsi(c, 1, 2, 3, { re: 0, im: 0 });
      expectClose(psi.re, re, { rel: 1e-13 }, { n, l, m });
      expectClose(psi.im, im, { rel: 1e-13 }, { n, l, m });
    }
  });

  it('when at the nucleus, then |ψ_ns(0)|² = Z³/(π n³) (REFERENCE.md §6) and ψ = 0 for l > 0', () => {
    for (const [n, Z] of [
      [1, 1],
      [2, 1],
      [3, 5],
    ]) {
      const psi = psiAt({ Z, terms: [{ n, l: 0, m: 0, basis: 'real' }] }, 0, 0, 0);
      expectClose(psi.re ** 2, Z ** 3 / (Math.PI * n ** 3), { rel: 1e-14 }, { n, Z });
    }
    expect(psiAt(single(3, 1, 0, 'real'), 0, 0, 0).re).toBe(0);
  });
});

describe('compileState', () => {
  it('when weights are unnormalised, then Σ|c|² = 1 and ψ scales accordingly', () => {
    const c = compileState({
      Z: 1,
      terms: [
        { n: 1, l: 0, m: 0, basis: 'real', weight: { re: 3, im: 0 } },
        { n: 2, l: 1, m: 0, basis: 'real', weight: { re: 4, im: 0 } },
      ],
    });
    const psi = evaluatePsi(c, 0.5, -0.2, 1.1, { re: 0, im: 0 });
    const expected =
      (3 * psiAt(single(1, 0, 0, 'real'), 0.5, -0.2, 1.1).re +
        4 * psiAt(single(2, 1, 0, 'real'), 0.5, -0.2, 1.1).re) /
      5;
    expectClose(psi.re, expected, { rel: 1e-14 });
    expect(
      c.terms.reduce((s, t) => s + t.coefficient.re ** 2 + t.coefficient.im ** 2, 0),
    ).toBeCloseTo(1, 14);
  });

  it('when real and complex terms of the same n, l are mixed, then they are combined before normalising (not treated as orthogonal)', () => {
    // p_x = (Y^{-1} − Y^{1})/√2 (REFERENCE.md §5), so p_x + Y^{-1} = (1 + 1/√2) Y^{-1} − Y^{1}/√2, norm² = 2 + √2.
    const state: OrbitalState = {
      Z: 1,
      terms: [
        { n: 2, l: 1, m: 1, basis: 'real' },
        { n: 2, l: 1, m: -1, basis: 'complex' },
      ],
    };
    const [x, y, z] = [0.7, -1.3, 0.4];
    const d = cartesianToSpherical(x, y, z);
    const R = radialFunction(2, 1, d.r);
    const yMinus = sphericalHarmonic(1, -1, d.theta, d.phi);
    const px = realHarmonicAtPoint(1, 1, x, y, z);
    const norm = Math.sqrt(2 + Math.SQRT2);
    const psi = psiAt(state, x, y, z);
    expectClose(psi.re, (R * (px + yMinus.re)) / norm, { rel: 1e-14 });
    expectClose(psi.im, (R * yMinus.im) / norm, { rel: 1e-14 });
  });

  it('when the normalised state is integrated over space, then ∫|ψ|² = 1 (product Gauss rule)', () => {
    const c = compileState({
      Z: 2,
      terms: [
        { n: 3, l: 2, m: -1, basis: 'real', weight: { re: 1, im: 2 } },
        { n: 3, l: 2, m: 1, basis: 'complex', weight: { re: -0.5, im: 0 } },
        { n: 2, l: 0, m: 0, basis: 'complex', weight: { re: 0, im: 1 } },
      ],
    });
    const radial = gaussLegendre(40);
    const polar = gaussLegendre(8);
    const nPhi = 9;
    const out = { re: 0, im: 0 };
    let total = 0;
    const panels = 30;
    const width = 1.5;
    for (let p = 0; p < panels; p++) {
      for (let a = 0; a < radial.nodes.length; a++) {
        const r = (p + 0.5 + 0.5 * radial.nodes[a]) * width;
        const wr = 0.5 * width * radial.weights[a] * r * r;
        for (let b = 0; b < polar.nodes.length; b++) {
          const ct = polar.nodes[b];
          const st = Math.sqrt(1 - ct * ct);
          for (let j = 0; j < nPhi; j++) {
            const phi = (2 * Math.PI * j) / nPhi;
            evaluatePsi(c, r * st * Math.cos(phi), r * st * Math.sin(phi), r * ct, out);
            total += wr * polar.weights[b] * ((2 * Math.PI) / nPhi) * (out.re ** 2 + out.im ** 2);
          }
        }
      }
    }
    expectClose(total, 1, { rel: 1e-12 });
  });

  it('when a superposition evolves, then the density beats with ΔE = E_2 − E_1 = 3/8 hartree (time in ħ/E_h)', () => {
    const state = (time: number): OrbitalState => ({
      Z: 1,
      time,
      terms: [
        { n: 1, l: 0, m: 0, basis: 'real' },
        { n: 2, l: 1, m: 0, basis: 'real' },
      ],
    });
    const a = psiAt(single(1, 0, 0, 'real'), 0.3, 0.1, 0.9).re;
    const b = psiAt(single(2, 1, 0, 'real'), 0.3, 0.1, 0.9).re;
    for (const t of [0, 1.3, 7]) {
      const psi = psiAt(state(t), 0.3, 0.1, 0.9);
      const expected = (a * a + b * b + 2 * a * b * Math.cos(0.375 * t)) / 2;
      expectClose(psi.re ** 2 + psi.im ** 2, expected, { rel: 1e-13 }, t);
    }
    expect(compileState(state(1.3)).isReal).toBe(false);
    expect(compileState(state((2 * Math.PI) / 0.375)).isReal).toBe(true);
  });

  it('when a real state is given negative or complex global weights, then isReal holds and the signs given are kept', () => {
    const neg = compileState({
      Z: 1,
      terms: [{ n: 2, l: 1, m: 0, basis: 'real', weight: { re: -1, im: 0 } }],
    });
    expect(neg.isReal).toBe(true);
    expect(neg.realTerms[0].coefficient).toEqual({ re: -1, im: 0 });
    const rotated = compileState({
      Z: 1,
      terms: [{ n: 2, l: 1, m: 0, basis: 'real', weight: { re: 0, im: 2 } }],
    });
    expect(rotated.isReal).toBe(true);
    expectClose(Math.abs(rotated.realTerms[0].coefficient.re), 1, { rel: 1e-15 });
    // Complex Y_1^{±1} combined as (Y^{-1} − Y^{1})/√2 is p_x: real.
    const px = compileState({
      Z: 1,
      terms: [
        { n: 2, l: 1, m: -1, basis: 'complex' },
        { n: 2, l: 1, m: 1, basis: 'complex', weight: { re: -1, im: 0 } },
      ],
    });
    expect(px.isReal).toBe(true);
    expectClose(evaluatePsi(px, 1, 2, 3, { re: 0, im: 0 }).re, 0.01535887820111114, { rel: 1e-13 });
  });

  it('when the ¹H reduced mass is asked for, then ψ(r) = μ^{3/2} ψ_∞(μr) (lengths in a_μ, REFERENCE.md §1)', () => {
    const mu = massRatioForNucleus(NUCLEAR_MASSES.hydrogen1);
    const c = compileState({
      Z: 1,
      reducedMass: true,
      terms: [{ n: 2, l: 1, m: 0, basis: 'real' }],
    });
    expectClose(c.muRatio, mu, { rel: 1e-15 });
    const psi = evaluatePsi(c, 1, 2, 3, { re: 0, im: 0 }).re;
    expectClose(psi, mu ** 1.5 * psiAt(single(2, 1, 0, 'real'), mu, 2 * mu, 3 * mu).re, {
      rel: 1e-14,
    });
    const d = compileState({
      Z: 1,
      reducedMass: { nuclearMassInElectronMasses: NUCLEAR_MASSES.hydrogen2 },
      terms: [{ n: 1, l: 0, m: 0, basis: 'real' }],
    });
    expectClose(d.muRatio, 3670.482967655 / 3671.482967655, { rel: 1e-15 });
  });

  it('when the input is bad, then OrbitalInputError names the field and the reason', () => {
    const base = (patch: Partial<OrbitalState['terms'][0]>): OrbitalState => ({
      Z: 1,
      terms: [{ n: 2, l: 1, m: 0, basis: 'real', ...patch }],
    });
    const cases: [OrbitalState, string, RegExp][] = [
      [base({ n: 0 }), 'terms[0].n', /at least 1/],
      [base({ l: 2 }), 'terms[0].l', /less than n/],
      [base({ m: 2 }), 'terms[0].m', /must not exceed l/],
      [base({ n: 2.5 }), 'terms[0].n', /integer/],
      [base({ basis: 'polar' as 'real' }), 'terms[0].basis', /real/],
      [base({ weight: { re: 0, im: 0 } }), 'terms', /total weight is zero/],
      [base({ weight: { re: Number.NaN, im: 0 } }), 'terms[0].weight.re', /finite/],
      [{ Z: 0, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] }, 'Z', /between 1 and 92/],
      [{ Z: 93, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] }, 'Z', /between 1 and 92/],
      [{ Z: 1.5, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] }, 'Z', /integer/],
      [{ Z: 1, terms: [] }, 'terms', /non-empty/],
      [
        { Z: 3, reducedMass: true, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] },
        'reducedMass',
        /nuclearMassInElectronMasses/,
      ],
      [
        { Z: 1, time: Number.POSITIVE_INFINITY, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] },
        'time',
        /finite/,
      ],
    ];
    for (const [state, field, reason] of cases) {
      let caught: unknown = null;
      try {
        compileState(state);
      } catch (err) {
        caught = err;
      }
      expect(caught, field).toBeInstanceOf(OrbitalInputError);
      expect((caught as OrbitalInputError).field).toBe(field);
      expect((caught as OrbitalInputError).message).toMatch(reason);
    }
    // Cancelling terms: p_x − (Y^{-1} − Y^{1})/√2 = 0.
    const cancel: OrbitalState = {
      Z: 1,
      terms: [
        { n: 2, l: 1, m: 1, basis: 'real' },
        { n: 2, l: 1, m: -1, basis: 'complex', weight: { re: -Math.SQRT1_2, im: 0 } },
        { n: 2, l: 1, m: 1, basis: 'complex', weight: { re: Math.SQRT1_2, im: 0 } },
      ],
    };
    expect(() => compileState(cancel)).toThrow(/total weight is zero/);
  });
});

describe('sampleStateOnGrid and suggestedExtent', () => {
  it('when a grid is sampled, then each point equals evaluatePsi at (−half + i·h, …), x fastest', () => {
    const c = compileState({
      Z: 1,
      terms: [
        { n: 4, l: 3, m: 1, basis: 'complex' },
        { n: 3, l: 2, m: -2, basis: 'real', weight: { re: 0.5, im: 0.5 } },
      ],
    });
    const grid = { n: 9, half: 12 };
    const re = new Float32Array(9 ** 3);
    const im = new Float32Array(9 ** 3);
    sampleStateOnGrid(c, grid, re, im);
    const h = 24 / 8;
    for (const [i, j, k] of [
      [0, 0, 0],
      [3, 5, 7],
      [8, 1, 4],
      [4, 4, 4],
    ]) {
      const psi = evaluatePsi(c, -12 + i * h, -12 + j * h, -12 + k * h, { re: 0, im: 0 });
      expect(re[gridIndex(9, i, j, k)]).toBe(Math.fround(psi.re));
      expect(im[gridIndex(9, i, j, k)]).toBe(Math.fround(psi.im));
    }
  });

  it('when the state is complex and no imaginary array is given, then the sampler refuses', () => {
    const c = compileState(single(2, 1, 1, 'complex'));
    expect(() => sampleStateOnGrid(c, { n: 4, half: 5 }, new Float32Array(64), null)).toThrow(
      /outIm/,
    );
    expect(() =>
      sampleStateOnGrid(c, { n: 1, half: 5 }, new Float32Array(64), new Float32Array(64)),
    ).toThrow(/grid.n/);
  });

  it('when the extent is suggested, then it is ≥ r_0.999 of every term and rounded up to two digits', () => {
    const c = compileState({
      Z: 1,
      terms: [
        { n: 1, l: 0, m: 0, basis: 'real' },
        { n: 3, l: 2, m: 0, basis: 'real' },
      ],
    });
    const extent = suggestedExtent(c);
    const r3d = radiusEnclosingProbability(3, 2, 0.999);
    expect(extent).toBeGreaterThanOrEqual(r3d);
    expect(extent).toBeLessThan(r3d * 1.1);
    expect(Number(extent.toPrecision(2))).toBe(extent);
    expect(
      suggestedExtent(compileState({ Z: 2, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] })),
    ).toBeCloseTo(Math.ceil(radiusEnclosingProbability(1, 0, 0.999, 2) * 10) / 10, 12);
  });
});

describe('hybrid orbitals (Pauling 1931, from memory)', () => {
  it('when sp, sp², sp³ sets are built, then each hybrid is normalised and the set orthonormal', () => {
    for (const set of [spHybrids(2), sp2Hybrids(2), sp3Hybrids(3)]) {
      const vectors = set.map((terms) => {
        const v = [0, 0, 0, 0];
        for (const t of terms) v[t.l === 0 ? 0 : t.m === 1 ? 1 : t.m === -1 ? 2 : 3] = t.weight!.re;
        expect(v[0]).toBeLessThan(0); // s negated: see the header of hybrid-orbitals.ts
        return v;
      });
      for (let a = 0; a < vectors.length; a++) {
        for (let b = 0; b < vectors.length; b++) {
          const dot = vectors[a].reduce((s, x, i) => s + x * vectors[b][i], 0);
          expectClose(dot, a === b ? 1 : 0, { abs: 1e-15 }, { a, b });
        }
      }
    }
  });

  it('when the first sp³ hybrid is evaluated, then its large lobe points along (1,1,1) among the cube diagonals', () => {
    const c = compileState({ Z: 1, terms: sp3Hybrids(2)[0] });
    const at = (x: number, y: number, z: number): number =>
      evaluatePsi(c, x, y, z, { re: 0, im: 0 }).re;
    // r = 5 bohr, beyond the 2s node at r = 2 bohr (REFERENCE.md §8), where most of the probability is
    const d = 5 / Math.sqrt(3);
    expect(at(d, d, d)).toBeGreaterThan(Math.abs(at(d, -d, -d)));
    expect(at(d, d, d)).toBeGreaterThan(Math.abs(at(-d, -d, -d)));
    // the same holds for the sp pair along ±z, and in the n = 3 shell
    const sp = spHybrids(3).map((terms) => compileState({ Z: 1, terms }));
    const z = (s: typeof sp[number], zz: number) => Math.abs(evaluatePsi(s, 0, 0, zz, { re: 0, im: 0 }).re);
    expect(z(sp[0], 12)).toBeGreaterThan(z(sp[0], -12));
    expect(z(sp[1], -12)).toBeGreaterThan(z(sp[1], 12));
    expect(() => spHybrids(1)).toThrow(OrbitalInputError);
  });
});
