// Derived radial quantities: expectation values (REFERENCE.md §7), nodes and most probable radii (§8),
// enclosed probability and r_p (§9), checked against the published closed forms and by quadrature.
import { describe, expect, it } from 'vitest';
import { radialFunction } from '../../../shared/physics/radial-function';
import { radialExpectationValues } from '../../../shared/physics/radial-expectation';
import { radialNodes } from '../../../shared/physics/radial-nodes';
import {
  mostProbableRadius,
  radialDistributionMaxima,
} from '../../../shared/physics/most-probable-radius';
import {
  cumulativeRadialProbability,
  radialDistribution,
} from '../../../shared/physics/radial-probability';
import { radiusEnclosingProbability } from '../../../shared/physics/radius-enclosing-probability';
import { expectClose } from './close-to';
import { integrate } from './quadrature';

describe('radialExpectationValues', () => {
  it('when tabulated, then ⟨r⟩…⟨1/r³⟩ equal REFERENCE.md §7 (Bethe & Salpeter §3, section from memory)', () => {
    const table: [number, number, number[]][] = [
      [1, 0, [3 / 2, 3, 15 / 2, 1, 2, Infinity]],
      [2, 0, [6, 42, 330, 1 / 4, 1 / 4, Infinity]],
      [2, 1, [5, 30, 210, 1 / 4, 1 / 12, 1 / 24]],
      [3, 0, [27 / 2, 207, 6885 / 2, 1 / 9, 2 / 27, Infinity]],
      [3, 1, [25 / 2, 180, 2835, 1 / 9, 2 / 81, 1 / 81]],
      [3, 2, [21 / 2, 126, 1701, 1 / 9, 2 / 135, 1 / 405]],
      [4, 0, [24, 648, 18720, 1 / 16, 1 / 32, Infinity]],
      [4, 3, [18, 360, 7920, 1 / 16, 1 / 224, 1 / 2688]],
    ];
    for (const [n, l, want] of table) {
      const e = radialExpectationValues(n, l);
      const got = [e.r, e.r2, e.r3, e.invR, e.invR2, e.invR3];
      got.forEach((v, i) =>
        want[i] === Infinity
          ? expect(v).toBe(Infinity)
          : expectClose(v, want[i], { rel: 1e-15 }, { n, l, i }),
      );
    }
  });

  it('when integrated numerically for all n ≤ 5 and Z = 1, 2, then quadrature of R² r^(2+k) agrees (1e-12)', () => {
    for (const Z of [1, 2]) {
      for (let n = 1; n <= 5; n++) {
        for (let l = 0; l < n; l++) {
          const e = radialExpectationValues(n, l, Z);
          const moment = (k: number): number =>
            integrate((r) => radialFunction(n, l, r, Z) ** 2 * r ** (2 + k), 0, 400 / Z, 1200, 20);
          const pairs: [number, number][] = [
            [1, e.r],
            [2, e.r2],
            [3, e.r3],
            [-1, e.invR],
            [-2, e.invR2],
          ];
          if (l > 0) pairs.push([-3, e.invR3]);
          for (const [k, v] of pairs) expectClose(moment(k), v, { rel: 1e-12 }, { n, l, Z, k });
        }
      }
    }
  });

  it("when Kramers' relation is applied, then it holds (REFERENCE.md §7; Griffiths 2nd ed. Problem 6.33, from memory)", () => {
    for (const [n, l] of [
      [3, 1],
      [4, 2],
      [5, 0],
      [7, 3],
    ]) {
      const e = radialExpectationValues(n, l);
      const moments: Record<number, number> = { [-1]: e.invR, 0: 1, 1: e.r, 2: e.r2, 3: e.r3 };
      for (let s = 1; s <= 3; s++) {
        const lhs =
          ((s + 1) / n ** 2) * moments[s] -
          (2 * s + 1) * moments[s - 1] +
          (s / 4) * ((2 * l + 1) ** 2 - s * s) * moments[s - 2];
        expectClose(lhs, 0, { abs: 1e-12 * moments[s] }, { n, l, s });
      }
    }
  });
});

describe('virial theorem (REFERENCE.md §7, textbook)', () => {
  it('when ⟨V⟩ = −Z⟨1/r⟩ is formed, then it equals 2E_n = −Z²/n² for every (n, l, Z) tried', () => {
    for (const [n, l, Z] of [
      [1, 0, 1],
      [2, 1, 1],
      [3, 2, 1],
      [4, 1, 2],
      [4, 3, 3],
      [30, 12, 92],
    ]) {
      expectClose(
        -Z * radialExpectationValues(n, l, Z).invR,
        -(Z * Z) / (n * n),
        { rel: 1e-15 },
        { n, l, Z },
      );
    }
  });
});

describe('radialNodes', () => {
  it('when n ≤ 5, then the nodes match the closed forms of REFERENCE.md §8 to 1e-10 bohr', () => {
    const c = (k: number): number => 8 + 8 * Math.cos((k * Math.PI) / 9);
    const table: [number, number, number[]][] = [
      [1, 0, []],
      [2, 0, [2]],
      [3, 0, [(9 - 3 * Math.sqrt(3)) / 2, (9 + 3 * Math.sqrt(3)) / 2]],
      [3, 1, [6]],
      [4, 0, [c(7), c(5), c(1)]],
      [4, 1, [10 - 2 * Math.sqrt(5), 10 + 2 * Math.sqrt(5)]],
      [4, 2, [12]],
      [5, 0, [1.858229819953579, 6.429087519115696, 14.32794687922275, 27.38473578170798]],
    ];
    for (const [n, l, want] of table) {
      const got = radialNodes(n, l);
      expect(got.length).toBe(n - l - 1);
      got.forEach((v, i) => expectClose(v, want[i], { abs: 1e-10 }, { n, l, i }));
    }
    expectClose(radialNodes(4, 0)[1], 6.610814578664557, { abs: 1e-12 });
  });

  it('when n = 30, then there are n − l − 1 nodes and R vanishes at each (relative to max|R|)', () => {
    for (const l of [0, 5, 20]) {
      const nodes = radialNodes(30, l);
      expect(nodes.length).toBe(29 - l);
      for (const r of nodes) expect(Math.abs(radialFunction(30, l, r))).toBeLessThan(1e-15);
    }
  });

  it('when Z = 2, then nodes scale as 1/Z', () => {
    expectClose(radialNodes(2, 0, 2)[0], 1, { rel: 1e-15 });
  });
});

describe('mostProbableRadius', () => {
  it('when tabulated, then the maxima of r²R² match REFERENCE.md §8', () => {
    expectClose(mostProbableRadius(1, 0), 1, { rel: 1e-13 });
    expectClose(mostProbableRadius(2, 1), 4, { rel: 1e-13 });
    expectClose(mostProbableRadius(3, 2), 9, { rel: 1e-13 });
    expectClose(mostProbableRadius(4, 3), 16, { rel: 1e-13 });
    expectClose(mostProbableRadius(2, 0), 3 + Math.sqrt(5), { rel: 1e-13 });
    expectClose(mostProbableRadius(3, 1), 12, { rel: 1e-13 });
    expectClose(mostProbableRadius(3, 0), 13.07403282802196, { rel: 1e-13 });
    expectClose(mostProbableRadius(4, 0), 24.61809203478083, { rel: 1e-13 });
    const maxima4s = radialDistributionMaxima(4, 0);
    [0.732343789082524, 4, 10.64956417613665, 24.61809203478083].forEach((v, i) =>
      expectClose(maxima4s[i], v, { rel: 1e-13 }, i),
    );
    const maxima3s = radialDistributionMaxima(3, 0);
    [0.740037080420508, 4.185930091557534, 13.07403282802196].forEach((v, i) =>
      expectClose(maxima3s[i], v, { rel: 1e-13 }, i),
    );
    expectClose(radialDistributionMaxima(2, 0)[0], 3 - Math.sqrt(5), { rel: 1e-13 });
  });

  it('when l = n − 1, then r_mp = n²/Z up to n = 30 (textbook; REFERENCE.md §8)', () => {
    for (const n of [5, 12, 30])
      expectClose(mostProbableRadius(n, n - 1, 3), (n * n) / 3, { rel: 1e-13 }, n);
  });

  it('when a dense grid is searched, then no point beats the reported global maximum', () => {
    for (const [n, l] of [
      [6, 0],
      [10, 3],
      [30, 2],
    ]) {
      const best = radialDistribution(n, l, mostProbableRadius(n, l));
      for (let r = 0.01; r < 3 * n * n; r += 0.05)
        expect(radialDistribution(n, l, r)).toBeLessThanOrEqual(best * (1 + 1e-12));
    }
  });
});

describe('cumulativeRadialProbability and radiusEnclosingProbability', () => {
  it('when closed forms exist, then P(r) matches REFERENCE.md §9 (1s inside a0 = 1 − 5e^-2, 2s, 2p)', () => {
    expectClose(cumulativeRadialProbability(1, 0, 1), 1 - 5 * Math.exp(-2), { rel: 1e-14 });
    expectClose(cumulativeRadialProbability(1, 0, 1), 0.3233235838169365, { rel: 1e-14 });
    expectClose(cumulativeRadialProbability(2, 0, 1), 0.03431646692496391, { rel: 1e-13 });
    expectClose(cumulativeRadialProbability(2, 1, 1), 1 - 65 / (24 * Math.E), { rel: 1e-13 });
    for (const x of [0.1, 0.7, 2, 5, 11, 40]) {
      const exact = 1 - Math.exp(-2 * x) * (1 + 2 * x + 2 * x * x);
      expectClose(cumulativeRadialProbability(1, 0, x), exact, { rel: 1e-13, abs: 1e-16 }, x);
    }
    // Near the nucleus the closed form cancels; use the series P(3, y) = y³e^{-y}/3! · Σ y^k/(4·5…(3+k)) (DLMF 8.7.1), y = 2x.
    const y = 0.002;
    const series =
      ((y ** 3 * Math.exp(-y)) / 6) * (1 + y / 4 + y ** 2 / 20 + y ** 3 / 120 + y ** 4 / 840);
    expectClose(cumulativeRadialProbability(1, 0, 0.001), series, { rel: 1e-13 }, 0.001);
  });

  it('when compared with direct quadrature of r²R² for n up to 30, then P agrees to 1e-12', () => {
    for (const [n, l] of [
      [3, 1],
      [7, 0],
      [15, 6],
      [30, 0],
      [30, 29],
    ]) {
      for (const f of [0.05, 0.4, 1, 1.7, 2.6]) {
        const r = f * n * n;
        const direct = integrate((t) => radialDistribution(n, l, t), 0, r, 800, 24);
        expectClose(cumulativeRadialProbability(n, l, r), direct, { abs: 1e-12 }, { n, l, r });
      }
    }
  });

  it('when p is given, then r_p matches REFERENCE.md §9 (1s, 2p, 3d) and P(r_p) = p', () => {
    const table: [number, number, number, number][] = [
      [0.5, 1.33703015686178, 4.670908882795984, 10.00445561182466],
      [0.9, 2.661160168917105, 7.99358958605263, 15.79810815974779],
      [0.95, 3.147896810935995, 9.153519026637573, 17.76359347863043],
      [0.99, 4.202973457442733, 11.60462557947718, 21.8559283055046],
    ];
    for (const [p, r1s, r2p, r3d] of table) {
      expectClose(radiusEnclosingProbability(1, 0, p), r1s, { rel: 1e-12 }, { p, state: '1s' });
      expectClose(radiusEnclosingProbability(2, 1, p), r2p, { rel: 1e-12 }, { p, state: '2p' });
      expectClose(radiusEnclosingProbability(3, 2, p), r3d, { rel: 1e-12 }, { p, state: '3d' });
    }
    expectClose(
      cumulativeRadialProbability(20, 4, radiusEnclosingProbability(20, 4, 0.999)),
      0.999,
      { abs: 1e-13 },
    );
  });

  it('when the 1s sphere enclosing p is found, then |ψ_1s(r_p)|² is the REFERENCE.md §9 isovalue', () => {
    const isovalues: [number, number][] = [
      [0.5, 0.02195434521057258],
      [0.9, 0.001553802348981213],
      [0.95, 5.869778296721651e-4],
      [0.99, 7.115309030325548e-5],
    ];
    for (const [p, density] of isovalues) {
      const rp = radiusEnclosingProbability(1, 0, p);
      // ψ_1s = R_10 Y_00 with Y_00 = 1/(2√π).
      expectClose(
        (radialFunction(1, 0, rp) / (2 * Math.sqrt(Math.PI))) ** 2,
        density,
        { rel: 1e-12 },
        p,
      );
    }
  });

  it('when r is 0 or very large, then P is 0 or 1', () => {
    expect(cumulativeRadialProbability(5, 2, 0)).toBe(0);
    expectClose(cumulativeRadialProbability(30, 10, 1e6), 1, { abs: 1e-14 });
  });
});
