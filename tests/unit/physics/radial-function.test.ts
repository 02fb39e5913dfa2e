// R_nl(r) against the closed forms and sample values of REFERENCE.md §4, and by quadrature (§7).
import { describe, expect, it } from 'vitest';
import { radialFunction } from '../../../shared/physics/radial-function';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { gaussLegendre } from '../../../shared/physics/gauss-legendre';
import { NUCLEAR_MASSES, massRatioForNucleus } from '../../../shared/physics/reduced-mass';
import { expectClose } from './close-to';
import { integrate } from './quadrature';

// REFERENCE.md §4, Griffiths 2nd ed. Table 4.7 and Pauling & Wilson (1935) (table numbers from memory); x = Zr/a0.
const closedForms: Record<string, (x: number) => number> = {
  '1,0': (x) => 2 * Math.exp(-x),
  '2,0': (x) => (1 / (2 * Math.SQRT2)) * (2 - x) * Math.exp(-x / 2),
  '2,1': (x) => (1 / (2 * Math.sqrt(6))) * x * Math.exp(-x / 2),
  '3,0': (x) => (2 / (81 * Math.sqrt(3))) * (27 - 18 * x + 2 * x * x) * Math.exp(-x / 3),
  '3,1': (x) => (4 / (81 * Math.sqrt(6))) * x * (6 - x) * Math.exp(-x / 3),
  '3,2': (x) => (4 / (81 * Math.sqrt(30))) * x * x * Math.exp(-x / 3),
  '4,0': (x) => (1 / 768) * (192 - 144 * x + 24 * x * x - x ** 3) * Math.exp(-x / 4),
  '4,1': (x) => (1 / (256 * Math.sqrt(15))) * x * (80 - 20 * x + x * x) * Math.exp(-x / 4),
  '4,2': (x) => (1 / (768 * Math.sqrt(5))) * x * x * (12 - x) * Math.exp(-x / 4),
  '4,3': (x) => (1 / (768 * Math.sqrt(35))) * x ** 3 * Math.exp(-x / 4),
};

// REFERENCE.md §4 sample values (computed there from the verified formula): R_nl(1 a0), R_nl(2 a0), Z = 1.
const samples: [number, number, number, number][] = [
  [1, 0, 0.7357588823428846, 0.2706705664732254],
  [2, 0, 0.2144409712401767, 0],
  [2, 1, 0.1238075524708008, 0.1501861529550426],
  [3, 0, 0.1123601233448963, -0.007319049676050102],
  [3, 1, 0.0722278228655755, 0.0828055945244197],
  [3, 2, 0.006460252871769618, 0.01851589382738868],
  [4, 0, 0.07199850989331998, -0.006318027705339931],
  [4, 1, 0.04791490370671344, 0.05383315538404895],
  [4, 2, 0.00498853291944141, 0.0141275394328671],
  [4, 3, 1.714080196350777e-4, 0.001067941599332138],
];

describe('radialFunction', () => {
  it('when n ≤ 4, then it equals the closed forms of REFERENCE.md §4 at Z = 1 and Z = 3 (1e-13 of max)', () => {
    for (const [key, form] of Object.entries(closedForms)) {
      const [n, l] = key.split(',').map(Number);
      for (const Z of [1, 3]) {
        for (const r of [0, 0.01, 0.3, 1, 2.5, 7, 15, 31]) {
          const expected = Z ** 1.5 * form(Z * r);
          expectClose(
            radialFunction(n, l, r, Z),
            expected,
            { rel: 1e-13, scale: 2 * Z ** 1.5 },
            { n, l, Z, r },
          );
        }
      }
    }
  });

  it('when sampled at 1 and 2 bohr, then it reproduces the REFERENCE.md §4 sample values (1e-13)', () => {
    for (const [n, l, at1, at2] of samples) {
      expectClose(radialFunction(n, l, 1), at1, { rel: 1e-13 }, { n, l, r: 1 });
      expectClose(radialFunction(n, l, 2), at2, { rel: 1e-13, abs: 1e-16 }, { n, l, r: 2 });
    }
  });

  it('when Z = 2, then R_10(1) = 4√2 e^-2 and R_21(1) match REFERENCE.md §4', () => {
    expectClose(radialFunction(1, 0, 1, 2), 0.7655719720832874, { rel: 1e-14 });
    expectClose(radialFunction(2, 1, 1, 2), 0.4247905887793226, { rel: 1e-14 });
  });

  it('when the ¹H reduced mass is used, then R scales as μ^{3/2} R(μr) (lengths in a_μ, REFERENCE.md §1)', () => {
    const mu = massRatioForNucleus(NUCLEAR_MASSES.hydrogen1);
    expectClose(radialFunction(2, 1, 3, 1, mu), mu ** 1.5 * closedForms['2,1'](mu * 3), {
      rel: 1e-14,
    });
  });

  it('when n is large, then the signs follow R > 0 near 0 and (−1)^(n−l−1) far out (REFERENCE.md §4)', () => {
    for (const [n, l] of [
      [30, 0],
      [30, 29],
      [25, 7],
    ]) {
      expect(radialFunction(n, l, 1e-3)).toBeGreaterThanOrEqual(0);
      expect(Math.sign(radialFunction(n, l, 4 * n * n))).toBe((n - l - 1) % 2 === 0 ? 1 : -1);
    }
  });

  it('when integrated, then ∫R² r² dr = 1 up to n = 30 (composite Gauss–Legendre)', () => {
    for (const [n, l] of [
      [1, 0],
      [5, 2],
      [12, 0],
      [20, 19],
      [30, 0],
      [30, 15],
      [30, 29],
    ]) {
      const norm = integrate(
        (r) => (radialFunction(n, l, r) * r) ** 2,
        0,
        6 * n * n + 60,
        1500,
        24,
      );
      expectClose(norm, 1, { rel: 1e-12 }, { n, l });
    }
  });

  it('when orthogonality is integrated, then ∫R_nl R_n′l r² dr = δ and the unequal-l overlaps are 32/(27√6) and −√3/2 (REFERENCE.md §7)', () => {
    const overlap = (n1: number, l1: number, n2: number, l2: number): number =>
      integrate(
        (r) => radialFunction(n1, l1, r) * radialFunction(n2, l2, r) * r * r,
        0,
        200,
        800,
        20,
      );
    for (let l = 0; l <= 3; l++) {
      for (let n1 = l + 1; n1 <= 5; n1++) {
        for (let n2 = n1; n2 <= 5; n2++)
          expectClose(overlap(n1, l, n2, l), n1 === n2 ? 1 : 0, { abs: 1e-13 }, { n1, n2, l });
      }
    }
    expectClose(overlap(1, 0, 2, 1), 32 / (27 * Math.sqrt(6)), { rel: 1e-13 });
    expectClose(overlap(1, 0, 2, 1), 0.4838498257349488, { rel: 1e-13 });
    expectClose(overlap(2, 0, 2, 1), -0.8660254037844386, { rel: 1e-13 });
  });

  it('when the quadrature nodes are checked, then 2-point Gauss–Legendre has ±1/√3 (A&S Table 25.4, from memory)', () => {
    const rule = gaussLegendre(2);
    expectClose(rule.nodes[1], 1 / Math.sqrt(3), { rel: 1e-15 });
    expectClose(rule.weights[0], 1, { rel: 1e-15 });
  });

  it('when the input is bad, then OrbitalInputError names the field', () => {
    const cases: [() => unknown, string][] = [
      [() => radialFunction(0, 0, 1), 'n'],
      [() => radialFunction(2, 2, 1), 'l'],
      [() => radialFunction(2.5, 0, 1), 'n'],
      [() => radialFunction(2, 0, -1), 'r'],
      [() => radialFunction(2, 0, 1, 93), 'Z'],
      [() => radialFunction(2, 0, 1, 1.5), 'Z'],
      [() => radialFunction(31, 0, 1), 'n'],
    ];
    for (const [call, field] of cases) {
      expect(call).toThrow(OrbitalInputError);
      try {
        call();
      } catch (err) {
        expect((err as OrbitalInputError).field).toBe(field);
      }
    }
  });
});
