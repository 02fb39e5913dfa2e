/**
 * The lowest levels of one shooting system: Sturm bisection on the node count brackets each level,
 * then Newton steps from the matching mismatch (energyCorrection) converge inside the bracket.
 *
 * Source: P. Giannozzi, "Numerical Methods in Quantum Mechanics", ch. 2 (bisection on the node
 * count combined with the perturbative energy update; from memory); the bracket from the Sturm
 * oscillation theorem is common practice (e.g. Koonin & Meredith, Computational Physics, §3.2).
 * Every count narrows the brackets of all levels at once, and a Newton step that leaves its
 * bracket is replaced by bisection, so the search cannot lose or swap a level.
 */
import { OrbitalInputError } from '../physics/orbital-input-error';
import { energyCorrection, sweepOutward, type ShootingSystem } from './numerov-shooting';

const MAX_ITERATIONS = 300;
/**
 * Relative size of the last Newton step that counts as converged. The mismatch carries round-off of
 * a few 1e-14 relative, where the steps stop shrinking; the discretisation error of the default grid
 * is ~1e-11, so 1e-13 is converged for every purpose, and so is a step of up to NOISE_TOLERANCE
 * that is no longer shrinking (round-off reached).
 */
const RELATIVE_TOLERANCE = 1e-13;
const NOISE_TOLERANCE = 1e-11;

export interface LevelBrackets {
  lo: number[];
  hi: number[];
}

/** Below this ratio of the bracket's ends a split is arithmetic, above it geometric. */
const WIDE_BRACKET = 16;

/**
 * Middle of a bracket. Brackets that span orders of magnitude (from the Coulomb well's depth at the
 * first grid point, −Z/r_min, up to the threshold 0) are split geometrically, which finds the level's
 * scale in a handful of counts instead of one halving per factor of two.
 */
export function splitBracket(lo: number, hi: number): number {
  if (lo < 0 && hi <= 0 && -lo > WIDE_BRACKET * -hi) return -Math.sqrt(-lo * Math.max(-hi, -lo * 1e-12));
  if (lo > 0 && hi > WIDE_BRACKET * lo && Number.isFinite(hi)) return Math.sqrt(lo * hi);
  return 0.5 * (lo + hi);
}

/** Brackets for levels 0 … count−1 between a lower bound (no level below) and an upper bound. */
export function levelBrackets(count: number, lower: number, upper: number): LevelBrackets {
  return { lo: new Array<number>(count).fill(lower), hi: new Array<number>(count).fill(upper) };
}

/** Counts the levels below E and narrows every bracket with the answer. */
export function countLevelsBelow(s: ShootingSystem, E: number, b: LevelBrackets): number {
  const c = sweepOutward(s, E);
  for (let k = 0; k < b.lo.length; k++) {
    if (k < c) b.hi[k] = Math.min(b.hi[k], E);
    else b.lo[k] = Math.max(b.lo[k], E);
  }
  return c;
}

/**
 * Energy of level k (k nodes) inside its bracket; `guess` (e.g. from a coarser grid) starts the
 * search. On return s holds the matched solution at that energy (read it with matchedState).
 */
export function findLevel(s: ShootingSystem, k: number, b: LevelBrackets, guess?: number): number {
  let E = guess !== undefined && guess > b.lo[k] && guess < b.hi[k] ? guess : splitBracket(b.lo[k], b.hi[k]);
  let lastStep = Infinity;
  for (let iter = 0; iter < MAX_ITERATIONS; iter++) {
    const c = countLevelsBelow(s, E, b);
    const scale = Math.max(Math.abs(E), 1e-12);
    if (c === k || c === k + 1) {
      const dE = energyCorrection(s, E);
      if (Number.isFinite(dE)) {
        const size = Math.abs(dE);
        if (size <= RELATIVE_TOLERANCE * scale) return E;
        if (size <= NOISE_TOLERANCE * scale && size > 0.5 * lastStep) return E;
        lastStep = size;
        const next = E + dE;
        if (next > b.lo[k] && next < b.hi[k]) {
          E = next;
          continue;
        }
      }
    }
    lastStep = Infinity;
    if (b.hi[k] - b.lo[k] <= RELATIVE_TOLERANCE * scale) break;
    E = splitBracket(b.lo[k], b.hi[k]);
  }
  // The bracket has shrunk to round-off without a clean Newton finish: take its middle.
  E = 0.5 * (b.lo[k] + b.hi[k]);
  sweepOutward(s, E);
  if (!Number.isFinite(energyCorrection(s, E))) {
    throw new OrbitalInputError('levels', `level with ${k} radial nodes could not be matched near E = ${E.toPrecision(6)} hartree`);
  }
  return E;
}
