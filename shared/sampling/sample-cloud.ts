/**
 * Probability clouds: points drawn exactly from |ψ|² of a compiled state (not a threshold of it),
 * reproducibly for a seed, with arg ψ at each point for colouring by phase or sign.
 *
 * Method. In the real basis the state is ψ = Σ_k c_k φ_k with real orthonormal φ_k = R_nl S_lm
 * (../physics/orbital-state, realTerms) and Σ|c_k|² = 1. Terms of one shell (n, l) form a group
 * g with ψ_g = R_nl(r) F_g(r̂), F_g = Σ_{k∈g} c_k S_k, and weight w_g = Σ_{k∈g} |c_k|² = ∫|ψ_g|².
 *  • One group: r from r²R_nl² (./radial-sampler, inverse CDF on a fine tabulation); the direction
 *    by rejection: a uniform direction û is kept with probability |F_g(û)|²/(w_g B_l), where
 *    B_l = (2l+1)/(4π). This bound holds everywhere: |Σ c_k S_k|² ≤ (Σ|c_k|²)(Σ_k S_k²) by
 *    Cauchy–Schwarz, and Σ_k S_k² ≤ Σ_m S_lm² = Σ_m |Y_l^m|² = (2l+1)/(4π) (Unsöld's theorem, the
 *    addition theorem of spherical harmonics at γ = 0, e.g. Jackson, Classical Electrodynamics,
 *    3rd ed., eq. 3.69, number from memory). Mean acceptance w_g B_l over ∫|F_g|² dΩ = 1/(2l+1)
 *    for a single term, more for a complex Y_l^m.
 *  • G groups: candidates x come from the mixture q(x) = Σ_g |ψ_g(x)|² (pick g with probability
 *    w_g, then draw from |ψ_g|²/w_g as above) and are kept with probability |ψ(x)|²/(G q(x)).
 *    This is a valid rejection sampler because |ψ|² = |Σ_g ψ_g|² ≤ G Σ_g |ψ_g|² = G q everywhere
 *    (Cauchy–Schwarz); kept points then have density exactly |ψ|²; mean acceptance 1/G
 *    (∫|ψ|² = 1, ∫G q = G). With one shell (any single orbital, real or complex) nothing is rejected.
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
/** Candidates allowed per requested point before giving up (mean need: G ≤ 64 candidates). */
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

/** One shell (n, l) of the state: its terms, radial table and direction bound w_g (2l+1)/(4π). */
interface ShellDraw {
  terms: CompiledRealTerm[];
  radial: RadialSampler;
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
  const shells = new Map<string, CompiledRealTerm[]>();
  for (const term of terms) {
    const key = `${term.n},${term.l}`;
    shells.set(key, [...(shells.get(key) ?? []), term]);
  }
  const draws: ShellDraw[] = [...shells.values()].map((group) => ({
    terms: group,
    radial: radialSampler(group[0].n, group[0].l, state.zEff),
    bound: (weightOf(group) * (2 * group[0].l + 1)) / FOUR_PI,
  }));
  const G = draws.length;
  // Picking probabilities w_g over their sum (Σ w_g = 1 up to rounding).
  const weightSum = draws.reduce((sum, d) => sum + weightOf(d.terms), 0);
  const pickCumulative = new Float64Array(G);
  let running = 0;
  for (let g = 0; g < G; g++) {
    running += weightOf(draws[g].terms) / weightSum;
    pickCumulative[g] = running;
  }
  pickCumulative[G - 1] = 1;
  const shellRe = new Float64Array(G);
  const shellIm = new Float64Array(G);

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
    const g = G === 1 ? 0 : pickTerm(pickCumulative, random.next());
    drawFromShell(draws[g], random, point);
    const x = point[0];
    const y = point[1];
    const z = point[2];
    const r2 = x * x + y * y + z * z;
    const r = Math.sqrt(r2);
    let re = 0;
    let im = 0;
    let mixture = 0;
    for (let h = 0; h < G; h++) {
      shellValue(draws[h].terms, x, y, z, r, r2, shellRe, shellIm, h);
      re += shellRe[h];
      im += shellIm[h];
      mixture += shellRe[h] * shellRe[h] + shellIm[h] * shellIm[h];
    }
    if (G > 1) {
      const density = re * re + im * im;
      if (!(mixture > 0) || random.next() * G * mixture >= density) continue;
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

function weightOf(group: readonly CompiledRealTerm[]): number {
  let w = 0;
  for (const t of group)
    w += t.coefficient.re * t.coefficient.re + t.coefficient.im * t.coefficient.im;
  return w;
}

/** One point from |ψ_g|²: radius from the radial table, direction by rejection against w_g (2l+1)/(4π). */
function drawFromShell(draw: ShellDraw, random: RandomSource, out: Float64Array): void {
  const r = draw.radial.draw(random);
  const terms = draw.terms;
  for (;;) {
    const cz = 1 - 2 * random.next();
    const azimuth = 2 * Math.PI * random.next();
    const s = Math.sqrt(Math.max(0, 1 - cz * cz));
    const ux = s * Math.cos(azimuth);
    const uy = s * Math.sin(azimuth);
    let re = 0;
    let im = 0;
    for (const term of terms) {
      const value = solidHarmonicValue(term.harmonic, ux, uy, cz, 1);
      re += term.coefficient.re * value;
      im += term.coefficient.im * value;
    }
    if (random.next() * draw.bound < re * re + im * im) {
      out[0] = r * ux;
      out[1] = r * uy;
      out[2] = r * cz;
      return;
    }
  }
}

/** ψ_g(x) = Σ_{k∈g} c_k R_nl(r) S_k(r̂), computed as in accumulateTerms, into re[h], im[h]. */
function shellValue(
  terms: readonly CompiledRealTerm[],
  x: number,
  y: number,
  z: number,
  r: number,
  r2: number,
  re: Float64Array,
  im: Float64Array,
  h: number,
): void {
  const first = terms[0];
  const rho = first.a * r;
  // R_nl(r)/r^l is shared by the shell; the solid harmonics carry r^l.
  const radial =
    first.radialScale * Math.exp(-rho / 2) * assocLaguerre(first.degree, first.alpha, rho);
  let sumRe = 0;
  let sumIm = 0;
  for (const term of terms) {
    const value = radial * solidHarmonicValue(term.harmonic, x, y, z, r2);
    sumRe += term.coefficient.re * value;
    sumIm += term.coefficient.im * value;
  }
  re[h] = sumRe;
  im[h] = sumIm;
}
