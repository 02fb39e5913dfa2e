/**
 * The radial solver (shared/solver) as the figure builders use it: the spec's potential built and
 * solved for the levels each l needs, solver errors renamed to the spec's fields, the classical
 * turning points of a level in V_eff, the number of digits an energy may be printed with, and the
 * note that names the method and the largest estimated error.
 *
 * Method and error estimate: shared/solver/solve-radial.ts (Numerov shooting in x = ln r,
 * Richardson-extrapolated from steps h and h/2; `error` is the Richardson estimate per level).
 */
import { OrbitalInputError } from '../physics/orbital-input-error';
import type { Potential } from '../solver/potential';
import { buildPotential } from '../solver/potentials/build-potential';
import { countBoundLevels } from '../solver/count-bound-levels';
import {
  DEFAULT_STEP,
  solveRadial,
  type RadialSolution,
  type SolvedLevel,
} from '../solver/solve-radial';
import type { PotentialSpec } from '../spec/figure-spec';
import { FigureSpecError } from './figure-error';
import { HARTREE_EV } from '../physics/constants';
import type { LengthUnit } from './length-units';
import { formatSignificant, superscriptInteger } from './number-format';

/** Most significant digits an energy is printed with, however small its estimated error. */
export const MAX_ENERGY_DIGITS = 6;
const MIN_ENERGY_DIGITS = 2;
/** Solutions kept for builders that ask again (panels of one figure, previews while typing). */
const CACHE_SIZE = 24;

export interface SolvedPotential {
  potential: Potential;
  /** One solution per requested l, in the order asked; null where a clamped l binds no level. */
  solutions: (RadialSolution | null)[];
}

export interface SolveFields {
  /** Spec path of the potential, e.g. "kind.potential". */
  potential: string;
  /** Spec paths blamed when an l binds no level, or fewer levels than asked. */
  l: (l: number) => string;
  levels: (l: number) => string;
}

const cache = new Map<string, RadialSolution>();

/** One l to solve: its lowest `levels` levels, or (clamp) as many of them as the potential binds. */
export interface SolveRequest {
  l: number;
  levels: number;
  clamp?: boolean;
}

function solveCached(
  potential: Potential,
  key: string,
  l: number,
  levels: number,
  mu: number,
): RadialSolution {
  const id = `${key}|${l}|${levels}|${mu}`;
  const hit = cache.get(id);
  if (hit) return hit;
  const solution = solveRadial({ potential, l, levels, muRatio: mu });
  if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  cache.set(id, solution);
  return solution;
}

/**
 * Builds the potential and solves, for each { l, levels }, the lowest `levels` levels of that l.
 * Bad parameters fail as "kind.potential.lambda"; unbound levels name the caller's l or levels field.
 */
export function solvePotential(
  spec: PotentialSpec,
  requests: readonly SolveRequest[],
  mu: number,
  fields: SolveFields,
): SolvedPotential {
  const potential = buildPotential(spec, fields.potential);
  const key = JSON.stringify(spec);
  const solutions = requests.map(({ l, levels, clamp }) => {
    try {
      const bound = clamp ? countBoundLevels(potential, l, mu, DEFAULT_STEP / 2) : levels;
      if (bound === 0) return null;
      return solveCached(potential, key, l, Math.min(levels, bound), mu);
    } catch (err) {
      if (!(err instanceof OrbitalInputError)) throw err;
      if (err.field === 'l') throw new FigureSpecError(fields.l(l), err.reason);
      if (err.field === 'levels') throw new FigureSpecError(fields.levels(l), err.reason);
      throw err;
    }
  });
  return { potential, solutions };
}

/** V_eff(r) = V(r) + l(l+1)/(2μr²), hartree. */
export function effectiveValue(potential: Potential, l: number, mu: number, r: number): number {
  return potential.evaluate(r) + (l * (l + 1)) / (2 * mu * r * r);
}

/**
 * The classically allowed range of a level: from the first to the last radius of the solver's grid
 * where V_eff < E, each end interpolated linearly between grid points; 0 inside when V_eff < E down
 * to the first point (Coulomb-like s levels, wells).
 */
export function turningPoints(
  solution: RadialSolution,
  potential: Potential,
  energy: number,
): [number, number] {
  const { r, l, muRatio: mu } = solution;
  const below = (i: number): number => effectiveValue(potential, l, mu, r[i]) - energy;
  let first = -1;
  let last = -1;
  for (let i = 0; i < r.length; i++) {
    if (below(i) < 0) {
      if (first < 0) first = i;
      last = i;
    }
  }
  if (first < 0) return [Number.NaN, Number.NaN];
  const cross = (i: number, j: number): number => {
    const a = below(i);
    const b = below(j);
    return r[i] + ((r[j] - r[i]) * a) / (a - b);
  };
  const inner = first === 0 ? 0 : cross(first - 1, first);
  const outer = last === r.length - 1 ? r[last] : cross(last, last + 1);
  return [inner, outer];
}

/**
 * Significant digits for a printed energy: as many as the estimated error leaves trustworthy (half a
 * unit of the last digit at least as large as the error), between 2 and MAX_ENERGY_DIGITS.
 */
export function energyDigits(energy: number, error: number): number {
  if (energy === 0) return MIN_ENERGY_DIGITS;
  const magnitude = Math.floor(Math.log10(Math.abs(energy)));
  for (let d = MAX_ENERGY_DIGITS; d > MIN_ENERGY_DIGITS; d--) {
    if (0.5 * Math.pow(10, magnitude - d + 1) >= error) return d;
  }
  return MIN_ENERGY_DIGITS;
}

/** The smallest power of ten above every level's estimated error, as "1 × 10⁻¹⁰". */
export function errorBound(levels: readonly SolvedLevel[]): { value: number; printed: string } {
  const largest = Math.max(0, ...levels.map((lv) => lv.error));
  const exponent = largest > 0 ? Math.ceil(Math.log10(largest) + 1e-12) : -15;
  return { value: Math.pow(10, exponent), printed: `1 × 10${superscriptInteger(exponent)}` };
}

/** The caution every figure with solved levels carries: method, source file and error bound. */
export function solverNote(levels: readonly SolvedLevel[], potential: Potential): string {
  const bound = errorBound(levels);
  return (
    `Solved numerically (Numerov shooting on a logarithmic grid, Richardson-extrapolated from two step sizes) for ${potential.label}, ${potential.formula}; ` +
    `estimated error of each level below ${bound.printed} hartree.`
  );
}

export interface EnergyUnit {
  symbol: string;
  perHartree: number;
}

/** Hartree beside lengths in bohr, eV beside pm or Å (the radial plot's rule). */
export function energyUnitFor(unit: LengthUnit): EnergyUnit {
  return unit.key === 'bohr'
    ? { symbol: 'hartree', perHartree: 1 }
    : { symbol: 'eV', perHartree: HARTREE_EV };
}

/** "−0.407058 hartree": an energy with the digits its estimated error (hartree) allows. */
export function printedEnergy(
  hartree: number,
  error: number,
  unit: EnergyUnit,
  maxDigits = MAX_ENERGY_DIGITS,
): string {
  const v = hartree * unit.perHartree;
  return `${formatSignificant(v, Math.min(maxDigits, energyDigits(v, error * unit.perHartree)))} ${unit.symbol}`;
}
