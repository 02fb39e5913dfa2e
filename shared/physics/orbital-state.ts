/**
 * Orbital states: superpositions Σ c_t ψ_{n l m} of hydrogen-like eigenfunctions on one nucleus, with
 * complex weights, optional reduced mass and time evolution; compiled once, evaluated many times.
 *
 * Conventions: ψ_nlm = R_nl(r) Y_l^m(θ, φ) (complex basis, Condon–Shortley) or R_nl(r) S_lm(θ, φ)
 * (real basis, REFERENCE.md §5); lengths in bohr, ψ in bohr^(−3/2), time in ħ/E_h.
 *
 * compileState:
 *  1. validates everything and throws OrbitalInputError naming the field (e.g. "terms[0].l");
 *  2. converts every term to the complex basis (S_l,+m = [Y^{−m} + (−1)^m Y^m]/√2,
 *     S_l,−m = i[Y^{−m} − (−1)^m Y^m]/√2), adds up duplicates, because real and complex terms of the same
 *     n, l are not orthogonal; then normalises so that Σ|c|² = 1 (the ψ_nlm are orthonormal);
 *  3. multiplies each coefficient by e^{−iE_n t} (E_n with the reduced mass when asked);
 *  4. rewrites the state in the real basis for evaluation (real solid harmonics are polynomials).
 *     If all real-basis coefficients share one phase, that global phase is removed (it is
 *     unobservable) and the state is marked isReal: ψ is then a real function. The phase removed is
 *     the one of the largest coefficient folded into (−π/2, π/2], so a state given with real weights
 *     (negative ones included) keeps exactly the signs it was given. `removedPhase` records it.
 */
import type { Complex } from './complex';
import { energyValue } from './energy-levels';
import { OrbitalInputError } from './orbital-input-error';
import {
  MAX_PRINCIPAL_QUANTUM_NUMBER,
  checkAngular,
  checkFinite,
  checkMagnetic,
  checkNuclearCharge,
  checkPrincipal,
} from './quantum-numbers';
import { reducedMassRatio } from './reduced-mass';
import { radialLogNormalisation } from './radial-function';
import { solidHarmonicPlan, solidHarmonicValue, type SolidHarmonicPlan } from './solid-harmonic';
import { assocLaguerre } from './assoc-laguerre';

export type { Complex } from './complex';
export type Basis = 'real' | 'complex';

export interface OrbitalTerm {
  n: number;
  l: number;
  m: number;
  basis: Basis;
  /** Default { re: 1, im: 0 }. */
  weight?: Complex;
}

export interface OrbitalState {
  Z: number;
  reducedMass?: boolean | { nuclearMassInElectronMasses: number };
  terms: OrbitalTerm[];
  /** Time in atomic units (ħ/E_h); default 0. */
  time?: number;
}

/** A term of the compiled state in the complex basis: coefficient of R_nl Y_l^m. */
export interface CompiledTerm {
  readonly n: number;
  readonly l: number;
  readonly m: number;
  readonly coefficient: Complex;
}

/** The same state in the real basis, with everything the evaluation loop needs precomputed. */
export interface CompiledRealTerm {
  readonly n: number;
  readonly l: number;
  /** Real-basis m: +m is the cos mφ function, −m the sin |m|φ one. */
  readonly m: number;
  readonly coefficient: Complex;
  /** Index into CompiledState.distinctN (terms with the same n share e^{−Z_eff r/n}). */
  readonly nIndex: number;
  /** Degree k = n − l − 1 and order α = 2l + 1 of the Laguerre polynomial. */
  readonly degree: number;
  readonly alpha: number;
  /** a = 2 Z_eff / n: ρ = a r. */
  readonly a: number;
  /** Normalisation times a^l, so that R_nl(r)/r^l = radialScale e^{−ρ/2} L(ρ). */
  readonly radialScale: number;
  readonly harmonic: SolidHarmonicPlan;
  /** True when the previous real term has the same n and l, so its radial factor can be reused. */
  readonly sameRadialAsPrevious: boolean;
}

export interface CompiledState {
  readonly Z: number;
  /** μ/m_e (1 for infinite nuclear mass). */
  readonly muRatio: number;
  /** Z·μ/m_e: the charge that enters R_nl when lengths are in bohr. */
  readonly zEff: number;
  readonly time: number;
  readonly isReal: boolean;
  /** Global phase factor taken out of the state (see header); {1, 0} when nothing was removed. */
  readonly removedPhase: Complex;
  readonly terms: readonly CompiledTerm[];
  readonly realTerms: readonly CompiledRealTerm[];
  readonly distinctN: readonly number[];
}

/** Largest number of terms in one state: protects the grid evaluation from runaway requests. */
export const MAX_STATE_TERMS = 64;
/** Coefficients this much smaller than the largest one cancelled out and are dropped. */
const CANCELLED = 1e-14;
/** Imaginary parts this much smaller than the largest coefficient count as rounding, not complexity. */
const REAL_TOLERANCE = 1e-12;

function readWeight(term: OrbitalTerm, field: string): Complex {
  if (term.weight === undefined) return { re: 1, im: 0 };
  if (typeof term.weight !== 'object' || term.weight === null)
    throw new OrbitalInputError(field, 'must be { re, im }');
  return {
    re: checkFinite(term.weight.re, `${field}.re`),
    im: checkFinite(term.weight.im, `${field}.im`),
  };
}

function compileRealTerm(
  n: number,
  l: number,
  m: number,
  coefficient: Complex,
  zEff: number,
  distinctN: number[],
  previous: { n: number; l: number } | undefined,
): CompiledRealTerm {
  const a = (2 * zEff) / n;
  return {
    n,
    l,
    m,
    coefficient,
    nIndex: distinctN.indexOf(n),
    degree: n - l - 1,
    alpha: 2 * l + 1,
    a,
    radialScale: Math.exp(radialLogNormalisation(n, l, zEff) + l * Math.log(a)),
    harmonic: solidHarmonicPlan(l, m, true),
    sameRadialAsPrevious: previous !== undefined && previous.n === n && previous.l === l,
  };
}

type Coefficient = { n: number; l: number; m: number; c: Complex };
const key = (n: number, l: number, m: number): string => `${n},${l},${m}`;
const size = (c: Complex): number => Math.hypot(c.re, c.im);

/** Validates the terms and adds them up in the complex basis; returns the map and Σ|weight| as given. */
function collectComplexBasis(terms: OrbitalTerm[]): {
  coefficients: Coefficient[];
  weightGiven: number;
} {
  const map = new Map<string, Coefficient>();
  const add = (n: number, l: number, m: number, re: number, im: number): void => {
    const entry = map.get(key(n, l, m)) ?? { n, l, m, c: { re: 0, im: 0 } };
    entry.c.re += re;
    entry.c.im += im;
    map.set(key(n, l, m), entry);
  };
  let weightGiven = 0;
  terms.forEach((term, i) => {
    const f = `terms[${i}]`;
    if (typeof term !== 'object' || term === null)
      throw new OrbitalInputError(f, 'must be an object');
    const n = checkPrincipal(term.n, `${f}.n`);
    const l = checkAngular(term.l, n, `${f}.l`);
    const m = checkMagnetic(term.m, l, `${f}.m`);
    if (term.basis !== 'real' && term.basis !== 'complex') {
      throw new OrbitalInputError(`${f}.basis`, 'must be "real" or "complex"');
    }
    const w = readWeight(term, `${f}.weight`);
    weightGiven += size(w);
    if (term.basis === 'complex' || m === 0) {
      add(n, l, m, w.re, w.im);
      return;
    }
    const mAbs = Math.abs(m);
    const s = (mAbs % 2 === 0 ? 1 : -1) / Math.SQRT2;
    if (m > 0) {
      add(n, l, -mAbs, w.re / Math.SQRT2, w.im / Math.SQRT2);
      add(n, l, mAbs, s * w.re, s * w.im);
    } else {
      // i·w/√2 on Y^{−m}, −i·w·(−1)^m/√2 on Y^{m}.
      add(n, l, -mAbs, -w.im / Math.SQRT2, w.re / Math.SQRT2);
      add(n, l, mAbs, s * w.im, -s * w.re);
    }
  });
  return { coefficients: [...map.values()], weightGiven };
}

/** Drops cancelled terms, normalises to Σ|c|² = 1, applies e^{−iE_n t}; sorted by n, l, m. */
function normaliseAndEvolve(
  entries: Coefficient[],
  weightGiven: number,
  muZ2: number,
  time: number,
): Coefficient[] {
  let norm2 = 0;
  let largest = 0;
  for (const e of entries) {
    norm2 += e.c.re * e.c.re + e.c.im * e.c.im;
    largest = Math.max(largest, size(e.c));
  }
  if (!(Math.sqrt(norm2) > CANCELLED * weightGiven)) {
    throw new OrbitalInputError(
      'terms',
      'the total weight is zero (the terms cancel or all weights are 0)',
    );
  }
  const kept = entries.filter((e) => size(e.c) > CANCELLED * largest);
  let keptNorm2 = 0;
  for (const e of kept) keptNorm2 += e.c.re * e.c.re + e.c.im * e.c.im;
  const scale = 1 / Math.sqrt(keptNorm2);
  for (const e of kept) {
    const angle = -energyValue(e.n, muZ2) * time;
    const c = Math.cos(angle);
    const s = Math.sin(angle);
    e.c = { re: (e.c.re * c - e.c.im * s) * scale, im: (e.c.re * s + e.c.im * c) * scale };
  }
  return kept.sort((p, q) => p.n - q.n || p.l - q.l || p.m - q.m);
}

/**
 * Real-basis coefficients: d_{+m} = [(−1)^m c_m + c_{−m}]/√2, d_{−m} = i[(−1)^m c_m − c_{−m}]/√2, d_0 = c_0.
 * Grouped by (n, l) because the input is sorted; cancelled ones dropped.
 */
function toRealBasis(kept: Coefficient[]): Coefficient[] {
  const lookup = new Map(kept.map((e) => [key(e.n, e.l, e.m), e.c]));
  const out: Coefficient[] = [];
  const seen = new Set<string>();
  for (const e of kept) {
    const mAbs = Math.abs(e.m);
    if (seen.has(key(e.n, e.l, mAbs))) continue;
    seen.add(key(e.n, e.l, mAbs));
    if (mAbs === 0) {
      out.push({ n: e.n, l: e.l, m: 0, c: { ...e.c } });
      continue;
    }
    const plus = lookup.get(key(e.n, e.l, mAbs)) ?? { re: 0, im: 0 };
    const minus = lookup.get(key(e.n, e.l, -mAbs)) ?? { re: 0, im: 0 };
    const s = mAbs % 2 === 0 ? 1 : -1;
    const difRe = (s * plus.re - minus.re) / Math.SQRT2;
    const difIm = (s * plus.im - minus.im) / Math.SQRT2;
    out.push({
      n: e.n,
      l: e.l,
      m: mAbs,
      c: { re: (s * plus.re + minus.re) / Math.SQRT2, im: (s * plus.im + minus.im) / Math.SQRT2 },
    });
    out.push({ n: e.n, l: e.l, m: -mAbs, c: { re: -difIm, im: difRe } });
  }
  const biggest = Math.max(...out.map((r) => size(r.c)));
  return out.filter((r) => size(r.c) > CANCELLED * biggest);
}

/**
 * The phase factor to multiply by so that the largest real-basis coefficient becomes real, its phase
 * folded into (−π/2, π/2] (real weights keep their signs); null when the state stays complex after it.
 */
function realisingPhase(real: Coefficient[]): Complex | null {
  let biggest = real[0];
  for (const r of real) if (size(r.c) > size(biggest.c)) biggest = r;
  let phase = Math.atan2(biggest.c.im, biggest.c.re);
  if (phase > Math.PI / 2) phase -= Math.PI;
  if (phase <= -Math.PI / 2) phase += Math.PI;
  const undo = { re: Math.cos(phase), im: -Math.sin(phase) };
  const tolerance = REAL_TOLERANCE * size(biggest.c);
  return real.every((r) => Math.abs(r.c.re * undo.im + r.c.im * undo.re) <= tolerance)
    ? undo
    : null;
}

export function compileState(state: OrbitalState): CompiledState {
  if (typeof state !== 'object' || state === null)
    throw new OrbitalInputError('state', 'must be an object');
  const Z = checkNuclearCharge(state.Z);
  const muRatio = reducedMassRatio(Z, state.reducedMass);
  const zEff = Z * muRatio;
  const time = state.time === undefined ? 0 : checkFinite(state.time, 'time');
  if (!Array.isArray(state.terms) || state.terms.length === 0) {
    throw new OrbitalInputError('terms', 'must be a non-empty list');
  }
  if (state.terms.length > MAX_STATE_TERMS) {
    throw new OrbitalInputError(
      'terms',
      `at most ${MAX_STATE_TERMS} terms, got ${state.terms.length}`,
    );
  }

  const { coefficients, weightGiven } = collectComplexBasis(state.terms);
  const kept = normaliseAndEvolve(coefficients, weightGiven, Z * Z * muRatio, time);
  const real = toRealBasis(kept);
  const undo = realisingPhase(real);
  const rotate = (c: Complex): Complex =>
    undo === null
      ? { ...c }
      : { re: c.re * undo.re - c.im * undo.im, im: c.re * undo.im + c.im * undo.re };

  const distinctN = [...new Set(real.map((r) => r.n))].sort((p, q) => p - q);
  const realTerms = real.map((r, i) => {
    const c = rotate(r.c);
    const coefficient = undo === null ? c : { re: c.re, im: 0 };
    return compileRealTerm(r.n, r.l, r.m, coefficient, zEff, distinctN, real[i - 1]);
  });
  return {
    Z,
    muRatio,
    zEff,
    time,
    isReal: undo !== null,
    removedPhase: undo === null ? { re: 1, im: 0 } : { re: undo.re, im: -undo.im },
    terms: kept.map((e) => ({ n: e.n, l: e.l, m: e.m, coefficient: rotate(e.c) })),
    realTerms,
    distinctN,
  };
}

/**
 * Adds ψ(x, y, z) of all real-basis terms into out; r2 = x² + y² + z², expN[i] = e^{−Z_eff r / distinctN[i]}.
 * Shared by evaluatePsi and the grid sampler so both compute exactly the same numbers.
 */
export function accumulateTerms(
  c: CompiledState,
  x: number,
  y: number,
  z: number,
  r: number,
  r2: number,
  expN: Float64Array,
  out: Complex,
): Complex {
  let re = 0;
  let im = 0;
  const terms = c.realTerms;
  let radial = 0;
  for (let t = 0; t < terms.length; t++) {
    const term = terms[t];
    if (!term.sameRadialAsPrevious) {
      radial =
        term.radialScale * expN[term.nIndex] * assocLaguerre(term.degree, term.alpha, term.a * r);
    }
    const angular = solidHarmonicValue(term.harmonic, x, y, z, r2);
    const value = radial * angular;
    re += term.coefficient.re * value;
    im += term.coefficient.im * value;
  }
  out.re = re;
  out.im = im;
  return out;
}

/** e^{−Z_eff r/n} for each distinct n (= e^{−ρ/2}). */
export function fillExponentials(c: CompiledState, r: number, expN: Float64Array): void {
  for (let i = 0; i < c.distinctN.length; i++) expN[i] = Math.exp((-c.zEff * r) / c.distinctN[i]);
}

/** ψ(x, y, z) of a compiled state, x, y, z in bohr, ψ in bohr^(−3/2) (global phase as in the header). */
const scratchExponentials = new Float64Array(MAX_PRINCIPAL_QUANTUM_NUMBER + 1);

export function evaluatePsi(
  c: CompiledState,
  x: number,
  y: number,
  z: number,
  out: Complex,
): Complex {
  const r2 = x * x + y * y + z * z;
  const r = Math.sqrt(r2);
  fillExponentials(c, r, scratchExponentials);
  return accumulateTerms(c, x, y, z, r, r2, scratchExponentials, out);
}
