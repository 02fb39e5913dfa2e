// shared/physics against the mpmath fixtures of scripts/fixtures/orbital-values.py (tests/fixtures/…):
// relative accuracy 1e-10 scaled by the function's maximum (absolute near nodes), as the fixtures record.
import { describe, expect, it } from 'vitest';
import radialLow from '../../fixtures/radial-function/low-n.json';
import radialHigh from '../../fixtures/radial-function/high-n.json';
import probability from '../../fixtures/cumulative-radial-probability/mixed-n.json';
import nodes from '../../fixtures/radial-nodes/mixed-n.json';
import harmonics from '../../fixtures/spherical-harmonic/l-up-to-30.json';
import realHarmonics from '../../fixtures/real-spherical-harmonic/l-up-to-30.json';
import { radialFunction } from '../../../shared/physics/radial-function';
import { cumulativeRadialProbability } from '../../../shared/physics/radial-probability';
import { radialNodes } from '../../../shared/physics/radial-nodes';
import { sphericalHarmonic } from '../../../shared/physics/spherical-harmonic';
import { realSphericalHarmonic } from '../../../shared/physics/real-spherical-harmonic';
import { realSolidHarmonic } from '../../../shared/physics/solid-harmonic';
import { sphericalToCartesian } from '../../../shared/physics/coordinates';
import { expectClose } from './close-to';

const TOLERANCE = 1e-10;

describe('fixtures from mpmath (scripts/fixtures/orbital-values.py)', () => {
  it('when R_nl is evaluated for n ≤ 6 and n up to 30 (l up to 29), then it matches within 1e-10 of max|R|', () => {
    const cases = [...radialLow.cases, ...radialHigh.cases];
    expect(cases.length).toBeGreaterThan(500);
    expect(Math.max(...cases.map((c) => c.n))).toBe(30);
    expect(Math.max(...cases.map((c) => c.l))).toBe(29);
    for (const c of cases) {
      expectClose(radialFunction(c.n, c.l, c.r, c.Z), c.R, { rel: TOLERANCE, scale: c.scale }, c);
    }
  });

  it('when the cumulative radial probability is evaluated, then it matches the exact incomplete-gamma sums to 1e-12', () => {
    for (const c of probability.cases) {
      expectClose(cumulativeRadialProbability(c.n, c.l, c.r, c.Z), c.P, { abs: 1e-12 }, c);
    }
  });

  it('when radial nodes are found, then they match mpmath.polyroots to 1e-10 bohr', () => {
    for (const c of nodes.cases) {
      const got = radialNodes(c.n, c.l, c.Z);
      expect(got.length).toBe(c.nodes.length);
      got.forEach((r, i) => expectClose(r, c.nodes[i], { abs: 1e-10 }, { ...c, i }));
    }
  });

  it('when Y_lm (complex, l ≤ 30) is evaluated, then it matches mpmath.spherharm within 1e-10 of √((2l+1)/4π)', () => {
    expect(Math.max(...harmonics.cases.map((c) => c.l))).toBe(30);
    for (const c of harmonics.cases) {
      const y = sphericalHarmonic(c.l, c.m, c.theta, c.phi);
      expectClose(y.re, c.re, { rel: TOLERANCE, scale: c.scale }, c);
      expectClose(y.im, c.im, { rel: TOLERANCE, scale: c.scale }, c);
    }
  });

  it('when real S_lm (l ≤ 30) is evaluated from angles and as a solid harmonic, then both match', () => {
    for (const c of realHarmonics.cases) {
      expectClose(
        realSphericalHarmonic(c.l, c.m, c.theta, c.phi),
        c.S,
        { rel: TOLERANCE, scale: c.scale },
        c,
      );
      const u = sphericalToCartesian(1, c.theta, c.phi);
      expectClose(
        realSolidHarmonic(c.l, c.m, u.x, u.y, u.z),
        c.S,
        { rel: TOLERANCE, scale: c.scale },
        { ...c, route: 'solid' },
      );
    }
  });
});
