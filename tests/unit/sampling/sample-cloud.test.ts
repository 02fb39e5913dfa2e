// Probability clouds: sample statistics against exact expectation values and enclosed probabilities.
// Tolerance: 5 standard errors, each from the sample's own variance with N = 200 000 points
// (a correct sampler fails one such check with probability 6e-7); the seeds are fixed, so runs repeat.
import { describe, expect, it } from 'vitest';
import { compileState, type OrbitalTerm } from '../../../shared/physics/orbital-state';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { sampleCloud, type Cloud } from '../../../shared/sampling/sample-cloud';

const N = 200_000;
const SIGMAS = 5;

function cloudOf(terms: OrbitalTerm[], seed = 7, Z = 1): Cloud {
  return sampleCloud(compileState({ Z, terms }), { count: N, seed });
}

/** Mean of f over the cloud and its standard error. */
function meanOf(
  cloud: Cloud,
  f: (x: number, y: number, z: number, phase: number) => number,
): { mean: number; error: number } {
  let sum = 0;
  let sum2 = 0;
  for (let i = 0; i < cloud.count; i++) {
    const v = f(
      cloud.positions[3 * i],
      cloud.positions[3 * i + 1],
      cloud.positions[3 * i + 2],
      cloud.phases[i],
    );
    sum += v;
    sum2 += v * v;
  }
  const mean = sum / cloud.count;
  const variance = sum2 / cloud.count - mean * mean;
  return { mean, error: Math.sqrt(Math.max(variance, 0) / cloud.count) };
}

function expectStatistic(
  label: string,
  got: { mean: number; error: number },
  expected: number,
): void {
  const tolerance = SIGMAS * got.error;
  const message = `${label}: sample ${got.mean}, exact ${expected}, difference ${got.mean - expected}, tolerance ${tolerance}`;
  expect(Math.abs(got.mean - expected), message).toBeLessThanOrEqual(tolerance);
}

const radius = (x: number, y: number, z: number): number => Math.hypot(x, y, z);
const real = (n: number, l: number, m: number, weight = 1): OrbitalTerm => ({
  n,
  l,
  m,
  basis: 'real',
  weight: { re: weight, im: 0 },
});

describe('sampleCloud, single terms: ⟨r⟩ = [3n² − l(l+1)]/2 (REFERENCE.md §7, Bethe & Salpeter §3)', () => {
  const cases: [number, number, number, number][] = [
    [1, 0, 0, 1.5],
    [2, 1, 0, 5],
    [3, 2, -2, 21 / 2],
    [4, 0, 0, 24],
    [4, 3, 1, 18],
  ];
  for (const [n, l, m, expected] of cases) {
    it(`when (n, l, m) = (${n}, ${l}, ${m}) is sampled, then the mean radius is ${expected} bohr`, () => {
      expectStatistic(`⟨r⟩ ${n}${l}${m}`, meanOf(cloudOf([real(n, l, m)]), radius), expected);
    });
  }

  it('when He⁺ 2p_z (Z = 2) is sampled, then ⟨r⟩ scales as 1/Z: 5/2 bohr', () => {
    expectStatistic('⟨r⟩ He+ 2p', meanOf(cloudOf([real(2, 1, 0)], 3, 2), radius), 2.5);
  });
});

describe('sampleCloud, enclosed probability (REFERENCE.md §9)', () => {
  it('when 1s is sampled, then 90 % of the points lie inside r = 2.661160168917105 bohr', () => {
    expectStatistic(
      '1s inside r_0.9',
      meanOf(cloudOf([real(1, 0, 0)], 11), (x, y, z) =>
        radius(x, y, z) < 2.661160168917105 ? 1 : 0,
      ),
      0.9,
    );
  });
  it('when 1s is sampled, then P(r < a0) = 1 − 5e⁻² = 0.3233235838169365', () => {
    expectStatistic(
      '1s inside a0',
      meanOf(cloudOf([real(1, 0, 0)], 12), (x, y, z) => (radius(x, y, z) < 1 ? 1 : 0)),
      0.3233235838169365,
    );
  });
  it('when 2p_x is sampled, then half the points lie inside r = 4.670908882795984 bohr', () => {
    expectStatistic(
      '2p inside r_0.5',
      meanOf(cloudOf([real(2, 1, 1)], 13), (x, y, z) =>
        radius(x, y, z) < 4.670908882795984 ? 1 : 0,
      ),
      0.5,
    );
  });
});

describe('sampleCloud, angular distribution', () => {
  it('when 2p_z is sampled, then ⟨cos²θ⟩ = 3/5 and the sign of ψ is the sign of z', () => {
    const cloud = cloudOf([real(2, 1, 0)], 21);
    // ∫ cos²θ |S_10|² dΩ = (3/4π)·(4π/5) (elementary integral, common knowledge).
    expectStatistic(
      '2p_z ⟨cos²θ⟩',
      meanOf(cloud, (x, y, z) => (z * z) / (x * x + y * y + z * z)),
      3 / 5,
    );
    for (let i = 0; i < cloud.count; i++)
      expect(cloud.phases[i]).toBe(cloud.positions[3 * i + 2] < 0 ? Math.fround(Math.PI) : 0);
  });

  it('when complex 2p with m = +1 is sampled, then ⟨cos²θ⟩ = 1/5 and arg ψ − φ is constant', () => {
    // |Y_1^1|² = (3/8π) sin²θ: ⟨cos²θ⟩ = 0.2 (mpmath quad, 30 digits); Y_1^1 ∝ e^{iφ} (REFERENCE.md §5).
    const cloud = cloudOf([{ n: 2, l: 1, m: 1, basis: 'complex' }], 22);
    // One shell: the direction bound covers Σ_k|c_k|²·(2l+1)/4π, so no candidate is rejected.
    expect(cloud.candidates).toBe(N);
    expectStatistic(
      '2p(m=+1) ⟨cos²θ⟩',
      meanOf(cloud, (x, y, z) => (z * z) / (x * x + y * y + z * z)),
      0.2,
    );
    const offset = cloud.phases[0] - Math.atan2(cloud.positions[1], cloud.positions[0]);
    for (let i = 0; i < cloud.count; i += 97) {
      const d =
        cloud.phases[i] - Math.atan2(cloud.positions[3 * i + 1], cloud.positions[3 * i]) - offset;
      expect(Math.abs(Math.atan2(Math.sin(d), Math.cos(d)))).toBeLessThan(1e-5);
    }
  });
});

describe('sampleCloud, superpositions (rejection against the term mixture)', () => {
  it('when (2s + 2p_z)/√2 is sampled, then ⟨z⟩ = ⟨2s|z|2p_z⟩ = −3 bohr and ⟨r⟩ = (6 + 5)/2', () => {
    // ⟨200|z|210⟩ = −3 a0 with the sign conventions of REFERENCE.md §4–5 (Stark-effect matrix element,
    // textbook; the value −3.0 recomputed with mpmath quad, 30 digits).
    const cloud = cloudOf([real(2, 0, 0), real(2, 1, 0)], 31);
    expectStatistic(
      'sp ⟨z⟩',
      meanOf(cloud, (_x, _y, z) => z),
      -3,
    );
    expectStatistic('sp ⟨r⟩', meanOf(cloud, radius), 5.5);
  });

  it('when (1s + 2s)/√2 is sampled, then ⟨r⟩ includes the cross term: 3.191298345729148 bohr', () => {
    // ½(⟨r⟩_1s + ⟨r⟩_2s) + ∫R_10 R_20 r³ dr = 3.75 − 0.558701654…; mpmath quad, 30 digits (computed here).
    const cloud = cloudOf([real(1, 0, 0), real(2, 0, 0)], 32);
    expectStatistic('1s+2s ⟨r⟩', meanOf(cloud, radius), 3.191298345729148);
    expectStatistic(
      '1s+2s ⟨r²⟩',
      meanOf(cloud, (x, y, z) => x * x + y * y + z * z),
      19.52025784388879,
    );
  });

  it('when an sp3 hybrid (2s + 2p_x + 2p_y + 2p_z)/2 is sampled, then ⟨x⟩ = ⟨y⟩ = ⟨z⟩ = −3/2 bohr', () => {
    // ⟨ψ|x|ψ⟩ = 2·(1/2)(1/2)·⟨2s|x|2p_x⟩ = −3/2 by symmetry with the ⟨2s|z|2p_z⟩ = −3 above.
    const cloud = cloudOf([real(2, 0, 0), real(2, 1, 1), real(2, 1, -1), real(2, 1, 0)], 33);
    expectStatistic(
      'sp3 ⟨x⟩',
      meanOf(cloud, (x) => x),
      -1.5,
    );
    expectStatistic(
      'sp3 ⟨y⟩',
      meanOf(cloud, (_x, y) => y),
      -1.5,
    );
    expectStatistic(
      'sp3 ⟨z⟩',
      meanOf(cloud, (_x, _y, z) => z),
      -1.5,
    );
    // Two shells (2s, 2p): each candidate is kept with mean probability exactly 1/2, so the number of
    // candidates is N plus a negative binomial count with mean N and variance 2N.
    const sd = Math.sqrt(2 * N);
    expect(
      Math.abs(cloud.candidates - 2 * N),
      `candidates ${cloud.candidates}, expected ${2 * N} ± ${SIGMAS * sd}`,
    ).toBeLessThanOrEqual(SIGMAS * sd);
  });
});

describe('sampleCloud, reproducibility and input checks', () => {
  const state = compileState({ Z: 1, terms: [real(3, 2, 1)] });
  it('when the same seed is used twice, then the clouds are identical; another seed gives another cloud', () => {
    const a = sampleCloud(state, { count: 5000, seed: 42 });
    const b = sampleCloud(state, { count: 5000, seed: 42 });
    const c = sampleCloud(state, { count: 5000, seed: 43 });
    expect(Buffer.from(a.positions.buffer).equals(Buffer.from(b.positions.buffer))).toBe(true);
    expect(Buffer.from(a.phases.buffer).equals(Buffer.from(b.phases.buffer))).toBe(true);
    expect(Buffer.from(a.positions.buffer).equals(Buffer.from(c.positions.buffer))).toBe(false);
  });
  it('when the count or the seed is bad, then an error names the field', () => {
    expect(() => sampleCloud(state, { count: 0, seed: 1 })).toThrow(OrbitalInputError);
    expect(() => sampleCloud(state, { count: 2.5, seed: 1 })).toThrow(/^count:/);
    expect(() => sampleCloud(state, { count: 10, seed: -1 })).toThrow(/^seed:/);
    expect(() => sampleCloud(state, { count: 10, seed: 2 ** 32 })).toThrow(/^seed:/);
  });
});
