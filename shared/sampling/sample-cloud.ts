/**
 * Probability clouds: points drawn exactly from |ψ|² of a compiled state (not a threshold of it),
 * reproducibly for a seed, with arg ψ at each point for colouring by phase or sign.
 *
 * Method. In the real basis the state is ψ = Σ_k c_k φ_k with real orthonormal φ_k = R_nl S_lm
 * (../physics/orbital-state, realTerms) and Σ|c_k|² = 1.
 *  • One term: r from r²R_nl² (./radial-sampler, inverse CDF on a fine tabulation); the direction
 *    by rejection: a uniform direction û is kept with probability S_lm(û)²/B_l, where
 *    B_l = (2l+1)/(4π) bounds S_lm² everywhere, because Σ_m S_lm² = Σ_m |Y_l^m|² = (2l+1)/(4π)
 *    (Unsöld's theorem; the addition theorem of spherical harmonics at γ = 0, e.g. Jackson,
 *    Classical Electrodynamics, 3rd ed., eq. 3.69, number from memory). Mean acceptance 1/(2l+1).
 *  • Superposition of K terms: candidates x come from the mixture q(x) = Σ_k |c_k|² φ_k(x)² (pick k
 *    with probability |c_k|², then draw from φ_k² as above) and are kept with probability
 *    |ψ(x)|² / (K q(x)). This is a valid rejection sampler because |ψ|² ≤ K q everywhere, by
 *    Cauchy–Schwarz: |Σ_k c_k φ_k|² ≤ (Σ_k 1)(Σ_k |c_k|² φ_k²). Kept points then have density
 *    exactly |ψ|²; mean acceptance 1/K (∫|ψ|² = 1, ∫K q = K). With K = 1 nothing is rejected.
 * φ_k(x) is computed from the compiled term exactly as accumulateTerms does (radialScale·e^{−ρ/2}·L·r^l S).
 * Exactness is limited only by the radial tabulation (bias < 1e-6 relative, see ./radial-sampler)
 * and by the 1e-12 of probability it leaves out at large r.
 *
 * Coordinates: physics frame of ../physics/coordinates (bohr, z up); the viewer converts.
 */
import type { CompiledRealTerm, CompiledState } from '../physics/orbital-state';
import { OrbitalInputError } from '../physics/orbital-input-error';
import { assocLaguerre } from '../physics/assoc-laguerre';
import { solidHarmonicValue } from '../physics/solid-harmonic';
import { radialSampler, type RadialSampler } from './radial-sampler';
import { xoshiro128, type RandomSource } from './xoshiro128';

/** Largest cloud drawn at once (12 MB of positions and phases). */
export const MAX_CLOUD_POINTS = 1_000_000;
/** Candidates allowed per requested point before giving up (mean need: K·(2l+1) ≤ 64·59 direction tries). */
const MAX_ATTEMPTS_PER_POINT = 100_000;
const FOUR_PI = 4 * Math.PI;
const PROGRESS_EVERY = 8192;

export interface Cloud {
  /** x, y, z per point, bohr, physics frame. */
  readonly positions: Float32Array;
  /** arg ψ per point in (−π, π]; 0 or π (sign) for a real state. */
  readonly phases: Float32Array;
  readonly count: number;
  /** Candidates drawn from the mixture (count/candidates is the acceptance rate). */
  readonly candidates: number;
  readonly seed: number;
}

export interface CloudOptions {
  count: number;
  /** Integer 0 … 2³² − 1. */
  seed: number;
  /** Called now and then with the number of points done. */
  onProgress?: (done: number) => void;
}

interface TermDraw {
  term: CompiledRealTerm;
  radial: RadialSampler;
  /** S_lm² bound (2l+1)/(4π). */
  bound: number;
}

export function sampleCloud(state: CompiledState, options: CloudOptions): Cloud {
  const { count, seed } = options;
  if (!Number.isInteger(count) || count < 1 || count > MAX_CLOUD_POINTS) {
    throw new OrbitalInputError(
      'count',
      `must be an integer from 1 to ${MAX_CLOUD_POINTS}, got ${String(count)}`,
    );
  }
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    throw new OrbitalInputError(
      'seed',
      `must be an integer from 0 to ${0xffffffff}, got ${String(seed)}`,
    );
  }
  const terms = state.realTerms;
  const K = terms.length;
  // |c_k|² as given (the bound |ψ|² ≤ K Σ|c_k|²φ_k² holds for any c); picking probabilities are them over their sum.
  const weights = new Float64Array(K);
  let weightSum = 0;
  for (let k = 0; k < K; k++) {
    const c = terms[k].coefficient;
    weights[k] = c.re * c.re + c.im * c.im;
    weightSum += weights[k];
  }
  const pickCumulative = new Float64Array(K);
  let running = 0;
  for (let k = 0; k < K; k++) {
    running += weights[k] / weightSum;
    pickCumulative[k] = running;
  }
  pickCumulative[K - 1] = 1;
  const draws: TermDraw[] = terms.map((term) => ({
    term,
    radial: radialSampler(term.n, term.l, state.zEff),
    bound: (2 * term.l + 1) / FOUR_PI,
  }));

  const random = xoshiro128(seed);
  const positions = new Float32Array(3 * count);
  const phases = new Float32Array(count);
  const point = new Float64Array(3);
  const maxCandidates = MAX_ATTEMPTS_PER_POINT * count;
  let candidates = 0;
  let done = 0;
  while (done < count) {
    if (candidates >= maxCandidates) {
      throw new OrbitalInputError(
        'state',
        `the cloud sampler accepted too few candidates (${done} of ${count} after ${candidates})`,
      );
    }
    candidates++;
    const k = K === 1 ? 0 : pickTerm(pickCumulative, random.next());
    drawFromTerm(draws[k], random, point);
    const x = point[0];
    const y = point[1];
    const z = point[2];
    let re = 0;
    let im = 0;
    let mixture = 0;
    const r2 = x * x + y * y + z * z;
    const r = Math.sqrt(r2);
    for (let j = 0; j < K; j++) {
      const phi = termValue(terms[j], x, y, z, r, r2);
      re += terms[j].coefficient.re * phi;
      im += terms[j].coefficient.im * phi;
      mixture += weights[j] * phi * phi;
    }
    if (K > 1) {
      const density = re * re + im * im;
      if (!(mixture > 0) || random.next() * K * mixture >= density) continue;
    }
    positions[3 * done] = x;
    positions[3 * done + 1] = y;
    positions[3 * done + 2] = z;
    phases[done] = state.isReal ? (re < 0 ? Math.PI : 0) : Math.atan2(im, re);
    done++;
    if (options.onProgress && done % PROGRESS_EVERY === 0) options.onProgress(done);
  }
  options.onProgress?.(count);
  return { positions, phases, count, candidates, seed };
}

function pickTerm(cumulative: Float64Array, u: number): number {
  let k = 0;
  while (k < cumulative.length - 1 && cumulative[k] <= u) k++;
  return k;
}

/** One point from φ_k²: radius from the radial table, direction by rejection against (2l+1)/(4π). */
function drawFromTerm(draw: TermDraw, random: RandomSource, out: Float64Array): void {
  const r = draw.radial.draw(random);
  const plan = draw.term.harmonic;
  for (;;) {
    const cz = 1 - 2 * random.next();
    const azimuth = 2 * Math.PI * random.next();
    const s = Math.sqrt(Math.max(0, 1 - cz * cz));
    const ux = s * Math.cos(azimuth);
    const uy = s * Math.sin(azimuth);
    const value = solidHarmonicValue(plan, ux, uy, cz, 1);
    if (random.next() * draw.bound < value * value) {
      out[0] = r * ux;
      out[1] = r * uy;
      out[2] = r * cz;
      return;
    }
  }
}

/** φ_k(x) = R_nl(r) S_lm(r̂), computed as in accumulateTerms. */
function termValue(
  term: CompiledRealTerm,
  x: number,
  y: number,
  z: number,
  r: number,
  r2: number,
): number {
  const rho = term.a * r;
  return (
    term.radialScale *
    Math.exp(-rho / 2) *
    assocLaguerre(term.degree, term.alpha, rho) *
    solidHarmonicValue(term.harmonic, x, y, z, r2)
  );
}
