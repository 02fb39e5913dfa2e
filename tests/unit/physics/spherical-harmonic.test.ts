// Complex and real spherical harmonics, solid harmonics, labels and angular nodes against REFERENCE.md §5.
import { describe, expect, it } from 'vitest';
import { sphericalHarmonic } from '../../../shared/physics/spherical-harmonic';
import { realSphericalHarmonic } from '../../../shared/physics/real-spherical-harmonic';
import { realHarmonicAtPoint, realSolidHarmonic } from '../../../shared/physics/solid-harmonic';
import { orbitalLabel } from '../../../shared/physics/orbital-labels';
import { angularNodes } from '../../../shared/physics/angular-nodes';
import { cartesianToSpherical } from '../../../shared/physics/coordinates';
import { gaussLegendre } from '../../../shared/physics/gauss-legendre';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { expectClose } from './close-to';

const { sqrt, PI, sin, cos } = Math;

// REFERENCE.md §5 table (Condon & Shortley 1935; DLMF 14.30): closed forms for m ≥ 0; values returned as [re, im].
const closed: Record<string, (t: number, p: number) => [number, number]> = {
  '0,0': () => [1 / (2 * sqrt(PI)), 0],
  '1,0': (t) => [0.5 * sqrt(3 / PI) * cos(t), 0],
  '1,1': (t, p) => [
    -0.5 * sqrt(3 / (2 * PI)) * sin(t) * cos(p),
    -0.5 * sqrt(3 / (2 * PI)) * sin(t) * sin(p),
  ],
  '2,0': (t) => [0.25 * sqrt(5 / PI) * (3 * cos(t) ** 2 - 1), 0],
  '2,1': (t, p) => {
    const a = -0.5 * sqrt(15 / (2 * PI)) * sin(t) * cos(t);
    return [a * cos(p), a * sin(p)];
  },
  '2,2': (t, p) => {
    const a = 0.25 * sqrt(15 / (2 * PI)) * sin(t) ** 2;
    return [a * cos(2 * p), a * sin(2 * p)];
  },
  '3,0': (t) => [0.25 * sqrt(7 / PI) * (5 * cos(t) ** 3 - 3 * cos(t)), 0],
  '3,1': (t, p) => {
    const a = -(1 / 8) * sqrt(21 / PI) * sin(t) * (5 * cos(t) ** 2 - 1);
    return [a * cos(p), a * sin(p)];
  },
  '3,2': (t, p) => {
    const a = 0.25 * sqrt(105 / (2 * PI)) * sin(t) ** 2 * cos(t);
    return [a * cos(2 * p), a * sin(2 * p)];
  },
  '3,3': (t, p) => {
    const a = -(1 / 8) * sqrt(35 / PI) * sin(t) ** 3;
    return [a * cos(3 * p), a * sin(3 * p)];
  },
};

describe('sphericalHarmonic (complex, Condon–Shortley)', () => {
  it('when l ≤ 3, then it equals the closed forms of REFERENCE.md §5, and Y_l^{-m} = (−1)^m conj(Y_l^m)', () => {
    for (const [key, form] of Object.entries(closed)) {
      const [l, m] = key.split(',').map(Number);
      for (const [t, p] of [
        [0.3, 0.4],
        [1, 2],
        [2.5, -1.2],
        [PI / 2, 3],
      ]) {
        const [re, im] = form(t, p);
        const y = sphericalHarmonic(l, m, t, p);
        expectClose(y.re, re, { rel: 1e-14, abs: 1e-15 }, { l, m, t, p });
        expectClose(y.im, im, { rel: 1e-14, abs: 1e-15 }, { l, m, t, p });
        const yNeg = sphericalHarmonic(l, -m, t, p);
        const s = m % 2 === 0 ? 1 : -1;
        expectClose(yNeg.re, s * re, { rel: 1e-14, abs: 1e-15 }, { l, m: -m, t, p });
        expectClose(yNeg.im, -s * im, { rel: 1e-14, abs: 1e-15 }, { l, m: -m, t, p });
      }
    }
  });

  it('when θ = π/4, φ = π/3, then it reproduces the mpmath spherharm docstring values (REFERENCE.md §5; 25 printed digits rounded to double)', () => {
    const t = PI / 4;
    const p = PI / 3;
    expectClose(sphericalHarmonic(0, 0, t, p).re, 0.28209479177387814, { rel: 1e-15 });
    const ym = sphericalHarmonic(1, -1, t, p);
    expectClose(ym.re, 0.12215062797572998, { rel: 1e-15 });
    expectClose(ym.im, -0.21157109383040862, { rel: 1e-15 });
    expectClose(sphericalHarmonic(1, 0, t, p).re, 0.3454941494713355, { rel: 1e-15 });
    const y1 = sphericalHarmonic(1, 1, t, p);
    expectClose(y1.re, -0.12215062797572998, { rel: 1e-15 });
    expectClose(y1.im, -0.21157109383040862, { rel: 1e-15 });
  });

  it('when θ = 1, φ = 2, then it reproduces the REFERENCE.md §5 sample values', () => {
    const table: [number, number, number, number][] = [
      [0, 0, 0.2820947917738781, 0],
      [1, 0, 0.2639930638341128, 0],
      [1, 1, 0.1209835825214897, -0.2643539506096446],
      [2, 0, -0.03917802060397175, 0],
      [2, 1, 0.1461666399821143, -0.3193799350399148],
      [2, 2, -0.1787783900459513, -0.2069934248193963],
      [3, 0, -0.3105811867209668, 0],
      [3, 1, 0.05201655460138779, -0.1136582453535517],
      [3, 2, -0.2555646979520824, -0.2958982463061625],
      [3, 3, -0.2386903148597636, 0.0694603594477664],
    ];
    for (const [l, m, re, im] of table) {
      const y = sphericalHarmonic(l, m, 1, 2);
      expectClose(y.re, re, { rel: 1e-14 }, { l, m });
      expectClose(y.im, im, { rel: 1e-14, abs: 1e-17 }, { l, m });
    }
  });

  it("when summed over m, then Unsöld's theorem Σ|Y_l^m|² = (2l+1)/4π holds for l ≤ 30 (REFERENCE.md §5; Unsöld 1927, citation from memory)", () => {
    const listed = [0.07957747154594767, 0.238732414637843, 0.3978873577297383, 0.5570423008216338];
    for (let l = 0; l <= 30; l++) {
      for (const [t, p] of [
        [0.01, 0.2],
        [1.1, 2.9],
        [3.1, -0.7],
      ]) {
        let sum = 0;
        let realSum = 0;
        for (let m = -l; m <= l; m++) {
          const y = sphericalHarmonic(l, m, t, p);
          sum += y.re * y.re + y.im * y.im;
          realSum += realSphericalHarmonic(l, m, t, p) ** 2;
        }
        expectClose(sum, (2 * l + 1) / (4 * PI), { rel: 1e-13 }, { l, t, p });
        expectClose(realSum, (2 * l + 1) / (4 * PI), { rel: 1e-13 }, { l, t, p, basis: 'real' });
        if (l < 4) expectClose(sum, listed[l], { rel: 1e-15 }, { l });
      }
    }
  });

  it('when integrated over the sphere with an exact product rule, then the functions are orthonormal (l ≤ 8)', () => {
    const L = 8;
    const rule = gaussLegendre(L + 2);
    const nPhi = 2 * L + 3;
    const fns: [number, number][] = [];
    for (let l = 0; l <= L; l++) for (let m = -l; m <= l; m++) fns.push([l, m]);
    for (const basis of ['complex', 'real'] as const) {
      for (let a = 0; a < fns.length; a += 7) {
        for (let b = 0; b < fns.length; b += 5) {
          let re = 0;
          let im = 0;
          for (let i = 0; i < rule.nodes.length; i++) {
            const t = Math.acos(rule.nodes[i]);
            for (let j = 0; j < nPhi; j++) {
              const p = (2 * PI * j) / nPhi;
              const w = (rule.weights[i] * 2 * PI) / nPhi;
              if (basis === 'real') {
                re +=
                  w *
                  realSphericalHarmonic(fns[a][0], fns[a][1], t, p) *
                  realSphericalHarmonic(fns[b][0], fns[b][1], t, p);
              } else {
                const ya = sphericalHarmonic(fns[a][0], fns[a][1], t, p);
                const yb = sphericalHarmonic(fns[b][0], fns[b][1], t, p);
                re += w * (ya.re * yb.re + ya.im * yb.im);
                im += w * (ya.re * yb.im - ya.im * yb.re);
              }
            }
          }
          expectClose(re, a === b ? 1 : 0, { abs: 1e-13 }, { basis, a: fns[a], b: fns[b] });
          expectClose(im, 0, { abs: 1e-13 }, { basis, a: fns[a], b: fns[b] });
        }
      }
    }
  });

  it('when l or m is out of range, then OrbitalInputError names the field', () => {
    expect(() => sphericalHarmonic(2, 3, 0, 0)).toThrow(OrbitalInputError);
    expect(() => sphericalHarmonic(31, 0, 0, 0)).toThrow(/l must be at most 30/);
    expect(() => realSphericalHarmonic(1, 0, Number.NaN, 0)).toThrow(/theta/);
  });
});

// REFERENCE.md §5 real harmonics (common practice): value at r̂ = (1,2,3)/√14.
const realTable: [string, number, number, number][] = [
  ['s', 0, 0, 0.2820947917738781],
  ['p_z', 1, 0, 0.3917535423981135],
  ['p_x', 1, 1, 0.1305845141327045],
  ['p_y', 1, -1, 0.261169028265409],
  ['d_z²', 2, 0, 0.2928635963059114],
  ['d_xz', 2, 1, 0.2341175208411598],
  ['d_yz', 2, -1, 0.4682350416823196],
  ['d_x²−y²', 2, 2, -0.1170587604205799],
  ['d_xy', 2, -2, 0.1560783472274399],
  ['f_z³', 3, 0, 0.06411572363594455],
  ['f_xz²', 3, 1, 0.2704763905176878],
  ['f_yz²', 3, -1, 0.5409527810353756],
  ['f_z(x²−y²)', 3, 2, -0.2483191298720504],
  ['f_xyz', 3, -2, 0.3310921731627339],
  ['f_x(x²−3y²)', 3, 3, -0.1239038292063471],
  ['f_y(3x²−y²)', 3, -3, -0.02252796894660857],
];

describe('real harmonics and real solid harmonics', () => {
  it('when evaluated at (1,2,3)/√14, then the REFERENCE.md §5 values come out by both routes (angles and polynomials)', () => {
    const dir = cartesianToSpherical(1, 2, 3);
    for (const [label, l, m, value] of realTable) {
      expectClose(realHarmonicAtPoint(l, m, 1, 2, 3), value, { rel: 1e-14 }, label);
      expectClose(realSphericalHarmonic(l, m, dir.theta, dir.phi), value, { rel: 1e-14 }, label);
      expectClose(realSolidHarmonic(l, m, 1, 2, 3), value * 14 ** (l / 2), { rel: 1e-14 }, label);
    }
  });

  it('when l = 0…30, then S_lm = √2(−1)^m Re/Im Y_l^|m| (REFERENCE.md §5 convention) and solid harmonics agree with angles', () => {
    for (let l = 0; l <= 30; l += 1) {
      for (let m = -l; m <= l; m++) {
        const [t, p] = [0.9, -2.2];
        const y = sphericalHarmonic(l, Math.abs(m), t, p);
        const s = Math.abs(m) % 2 === 0 ? 1 : -1;
        const expected = m === 0 ? y.re : m > 0 ? Math.SQRT2 * s * y.re : Math.SQRT2 * s * y.im;
        const fromAngles = realSphericalHarmonic(l, m, t, p);
        expectClose(fromAngles, expected, { abs: 1e-14 }, { l, m });
        const x = sin(t) * cos(p);
        const yy = sin(t) * sin(p);
        const z = cos(t);
        expectClose(
          realSolidHarmonic(l, m, 2 * x, 2 * yy, 2 * z),
          fromAngles * 2 ** l,
          { abs: 1e-13 * 2 ** l },
          { l, m },
        );
      }
    }
  });

  it('when the sign facts of REFERENCE.md §5 are checked, then each orbital is positive along its label, and f_y(3x²−y²) negative along +y', () => {
    expect(realHarmonicAtPoint(1, 1, 1, 0, 0)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(1, -1, 0, 1, 0)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(1, 0, 0, 0, 1)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(2, 0, 0, 0, 1)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(2, 2, 1, 0, 0)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(2, -2, 1, 1, 0)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(3, 0, 0, 0, 1)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(3, 3, 1, 0, 0)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(3, -2, 1, 1, 1)).toBeGreaterThan(0);
    expect(realHarmonicAtPoint(3, -3, 0, 1, 0)).toBeLessThan(0);
  });
});

describe('orbitalLabel', () => {
  it('when real l ≤ 3, then the conventional labels of REFERENCE.md §5 come out, with structured parts', () => {
    expect(orbitalLabel(3, 2, 0, 'real')).toEqual({
      text: '3d_z²',
      parts: [{ t: '3d' }, { sub: 'z²' }],
    });
    expect(orbitalLabel(1, 0, 0, 'real')).toEqual({ text: '1s', parts: [{ t: '1s' }] });
    const texts = realTable.map(([, l, m]) => orbitalLabel(4, l, m, 'real').text);
    expect(texts).toEqual(
      realTable.map(([label, l]) => (l === 0 ? '4s' : `4${'spdf'[l]}_${label.slice(2)}`)),
    );
  });

  it('when l ≥ 4 or complex, then the subscript is the signed m', () => {
    expect(orbitalLabel(5, 4, 2, 'real').text).toBe('5g_m=+2');
    expect(orbitalLabel(2, 1, -1, 'complex')).toEqual({
      text: '2p_m=-1',
      parts: [{ t: '2p' }, { sub: 'm=-1' }],
    });
    expect(orbitalLabel(30, 21, 0, 'real').text).toBe('30[l=21]_m=0');
  });
});

describe('angularNodes', () => {
  it('when d_z², then two cones at θ = arccos(±1/√3); p_x: one plane with normal x', () => {
    const dz2 = angularNodes(2, 0, 'real');
    expect(dz2.count).toBe(2);
    expect(dz2.planes).toEqual([]);
    expectClose(dz2.cones[0].halfAngle, Math.acos(-1 / sqrt(3)), { rel: 1e-14 });
    expectClose(dz2.cones[1].halfAngle, Math.acos(1 / sqrt(3)), { rel: 1e-14 });
    expect(angularNodes(1, 1, 'real')).toEqual({
      count: 1,
      planes: [{ kind: 'plane', normal: [1, 0, 0] }],
      cones: [],
    });
    expect(angularNodes(1, 0, 'real').planes).toEqual([{ kind: 'plane', normal: [0, 0, 1] }]);
  });

  it('when d_xy, then the xz and yz planes; d_x²−y², the two diagonal planes', () => {
    expect(angularNodes(2, -2, 'real').planes.map((p) => p.normal)).toEqual([
      [0, 1, 0],
      [1, 0, 0],
    ]);
    const diag = angularNodes(2, 2, 'real').planes.map((p) => p.normal);
    expectClose(diag[0][0], Math.SQRT1_2, { rel: 1e-15 });
    expectClose(Math.abs(diag[0][1]), Math.SQRT1_2, { rel: 1e-15 });
  });

  it('when any real (l, m) up to l = 12, then there are l surfaces and the function vanishes on each', () => {
    for (let l = 0; l <= 12; l++) {
      for (let m = -l; m <= l; m++) {
        const nodes = angularNodes(l, m, 'real');
        expect(nodes.count).toBe(l);
        for (const plane of nodes.planes) {
          // A point in the plane: a vector perpendicular to the normal, off the axes.
          const [a, b, c] = plane.normal;
          const v = c === 0 ? [-b * 0.8, a * 0.8, 0.6] : [0.6, 0.3, -(0.6 * a + 0.3 * b) / c];
          expect(Math.abs(realHarmonicAtPoint(l, m, v[0], v[1], v[2]))).toBeLessThan(1e-12);
        }
        for (const cone of nodes.cones) {
          expect(Math.abs(realSphericalHarmonic(l, m, cone.halfAngle, 0.37))).toBeLessThan(1e-12);
        }
      }
    }
  });

  it('when complex, then only the l − |m| Legendre surfaces remain', () => {
    expect(angularNodes(2, 1, 'complex').count).toBe(1);
    expect(angularNodes(3, 3, 'complex').count).toBe(0);
  });
});
