/**
 * The radial solver: the lowest levels of one angular momentum l in a central potential, with
 * energies, normalised u(r) = rR(r) and R(r), node counts, ⟨r⟩ and an error estimate per energy.
 *
 * Equation (atomic units, μ in electron masses): u'' = 2μ[V(r) + l(l+1)/(2μr²) − E] u, u(0) = 0,
 * u → 0 as r → ∞ (or u = 0 at a hard wall). Levels are labelled n = nodes + l + 1 as for hydrogen.
 *
 * Method: Numerov shooting on a logarithmic grid (./numerov-shooting, ./find-levels; Giannozzi's
 * lecture notes, from memory). The grid grows outwards until the highest level has died out
 * (WKB decay exponent ∫κ dr ≥ DECAY_EXPONENT past its outer turning point) and is refined until no
 * level turns by more than MAX_PHASE_PER_STEP per step. The levels are then solved again on a grid of
 * half the step and Richardson-extrapolated (L. F. Richardson, Phil. Trans. R. Soc. A 210, 307 (1911),
 * from memory) with the order of Numerov's scheme: 4, or 2 for a potential that jumps without saying
 * where and by how much (Potential.jump).
 *
 * Accuracy: `energy` is the extrapolated value; `error` = |E_h/2 − E_h|/(2^p − 1), the Richardson
 * estimate of the error of the fine-grid energy, which bounds that of the extrapolated one when the
 * error is in its asymptotic regime. u, R and ⟨r⟩ are from the fine grid. On the default grid the
 * hydrogen levels come out within ~1e-13 hartree (tests/unit/solver).
 * Bad requests and unbound levels throw OrbitalInputError naming the field.
 */
import { energyValue } from '../physics/energy-levels';
import { OrbitalInputError } from '../physics/orbital-input-error';
import { checkMassRatio, MAX_ANGULAR_MOMENTUM } from '../physics/quantum-numbers';
import { hartreeToEv } from '../physics/units';
import { countBoundLevels } from './count-bound-levels';
import { countLevelsBelow, findLevel, levelBrackets, type LevelBrackets } from './find-levels';
import { matchedState, type GridState, type ShootingSystem } from './numerov-shooting';
import type { Potential } from './potential';
import { gridPoints, radialSystem } from './radial-system';

/** Default step of the coarse grid in x = ln r; the fine grid has half of it. */
export const DEFAULT_STEP = 0.01;
/** Most levels per angular momentum in one request. */
export const MAX_LEVELS = 30;
/** Most points of the fine grid. */
export const MAX_GRID_POINTS = 200_000;
/** Past the outer turning point the highest level must fall by e^{−DECAY_EXPONENT}. */
const DECAY_EXPONENT = 20;
/** Largest phase (radians) a level may turn through in one step of the coarse grid. */
const MAX_PHASE_PER_STEP = 0.25;
/** Grid adjustments (extension or refinement) before giving up. */
const MAX_ADJUSTMENTS = 40;
/** Largest outer radius in units of the potential's length scale. */
const MAX_OUTER_SCALES = 1e7;

export interface SolveRadialRequest {
  potential: Potential;
  /** Angular momentum, 0 … 30. */
  l: number;
  /** How many of the lowest levels, 1 … MAX_LEVELS. */
  levels: number;
  /** Reduced mass μ/m_e in (0, 1] (default 1). */
  muRatio?: number;
  /** Coarse-grid step in ln r (default DEFAULT_STEP); the fine grid has half of it. */
  step?: number;
}

export interface HydrogenComparison {
  /** Charge used: the tail charge when V ≈ −Z_∞/r far out, else the charge at the nucleus. */
  Z: number;
  /** −μZ²/(2n²) for the same n, hartree. */
  energy: number;
  /** E − E_hydrogen, hartree. */
  shift: number;
  /** n − n*, n* = Z_∞/√(−2E/μ) (only with a Coulomb tail, for bound levels). */
  quantumDefect?: number;
}

export interface SolvedLevel {
  n: number;
  l: number;
  nodes: number;
  /** Richardson-extrapolated energy, hartree. */
  energy: number;
  energyEv: number;
  /** Estimated numerical error of the energy, hartree. */
  error: number;
  /** Energies on the fine (step h/2) and coarse (step h) grids, hartree. */
  energyFine: number;
  energyCoarse: number;
  /** ⟨r⟩ in bohr (fine grid). */
  rMean: number;
  /** u(r) = rR(r) on the grid, bohr^(−1/2), ∫u² dr = 1, positive near the nucleus. */
  u: Float64Array;
  /** R(r) on the grid, bohr^(−3/2). */
  R: Float64Array;
  hydrogen?: HydrogenComparison;
}

export interface RadialSolution {
  potential: { id: string; label: string; formula: string };
  l: number;
  muRatio: number;
  /** Fine grid radii, bohr. */
  r: Float64Array;
  grid: { points: number; step: number; rMin: number; rMax: number };
  /** Order p used in the Richardson step. */
  order: number;
  levels: SolvedLevel[];
}

function checkCount(value: unknown, field: string, max: number, min = 0): number {
  if (typeof value !== 'number' || !Number.isInteger(value))
    throw new OrbitalInputError(field, `must be an integer, got ${String(value)}`);
  if (value < min || value > max)
    throw new OrbitalInputError(field, `must be between ${min} and ${max}, got ${value}`);
  return value;
}

const levelName = (k: number, l: number): string => `n = ${k + l + 1}, l = ${l} (${k} radial nodes)`;

function refuseUnbound(bound: number, wanted: number, l: number, why: string): never {
  if (bound === 0) throw new OrbitalInputError('l', `the potential binds no level with l = ${l}${why}`);
  throw new OrbitalInputError(
    'levels',
    `the potential binds only ${bound} level${bound === 1 ? '' : 's'} with l = ${l}${why}; level ${levelName(bound, l)} is not bound`,
  );
}

/** First guess of the outer radius for `levels` levels of this l. */
function initialOuterRadius(p: Potential, l: number, levels: number, mu: number): number {
  if (p.hardWall !== undefined) return p.hardWall;
  if (p.outerLimit !== undefined) return p.outerLimit;
  const L = p.lengthScale;
  if (p.asymptotes.tailCharge > 0) {
    const n = levels + l;
    // Outer turning point 2n²/Z plus 30 decay lengths n/Z of the highest level.
    return (2 * n * n + 30 * n) / (mu * p.asymptotes.tailCharge);
  }
  if (!Number.isFinite(p.asymptotes.threshold)) return L * (Math.sqrt(4 * (levels + l) + 3) + 8);
  return Math.max(p.rangeEnd ?? 0, 40 * L);
}

function minimum(values: Float64Array): number {
  let m = Infinity;
  for (const v of values) if (v < m) m = v;
  return m;
}

/** Brackets for `levels` levels on s, or the number bound below the threshold when that is fewer. */
function bracketLevels(s: ShootingSystem, p: Potential, levels: number, upperHint?: number): LevelBrackets | number {
  const lower = minimum(s.vEff);
  const { threshold } = p.asymptotes;
  if (Number.isFinite(threshold)) {
    const b = levelBrackets(levels, lower, threshold);
    const below = countLevelsBelow(s, threshold, b);
    return below >= levels ? b : below;
  }
  let upper = upperHint ?? lower + 1 / (p.lengthScale * p.lengthScale);
  const b = levelBrackets(levels, lower, Infinity);
  for (let i = 0; i < 200 && countLevelsBelow(s, upper, b) < levels; i++) upper = lower + 2 * (upper - lower);
  return Number.isFinite(b.hi[levels - 1]) ? b : 0;
}

/** Decay exponent ∫κ dr past the outer turning point, and the largest phase per step inside. */
function gridQuality(s: ShootingSystem, E: number): { decay: number; phase: number; allowedToEnd: boolean } {
  const { r, vEff, step, mu } = s;
  const n = r.length;
  let decay = 0;
  let i = n - 1;
  for (; i > 0 && vEff[i] > E; i--) decay += step * r[i] * Math.sqrt(2 * mu * (vEff[i] - E));
  let phase = 0;
  for (; i > 0; i--) if (vEff[i] < E) phase = Math.max(phase, step * r[i] * Math.sqrt(2 * mu * (E - vEff[i])));
  return { decay, phase, allowedToEnd: vEff[n - 1] <= E };
}

function energiesOnGrid(s: ShootingSystem, b: LevelBrackets, levels: number, guesses: number[] | null): number[] {
  const out: number[] = [];
  for (let k = 0; k < levels; k++) out.push(findLevel(s, k, b, guesses?.[k]));
  return out;
}

function statesOnGrid(s: ShootingSystem, b: LevelBrackets, guesses: number[]): (GridState & { energy: number })[] {
  return guesses.map((guess, k) => {
    const energy = findLevel(s, k, b, guess);
    return { energy, ...matchedState(s) };
  });
}

export function solveRadial(request: SolveRadialRequest): RadialSolution {
  const p = request.potential;
  const l = checkCount(request.l, 'l', MAX_ANGULAR_MOMENTUM);
  const levels = checkCount(request.levels, 'levels', MAX_LEVELS, 1);
  const mu = checkMassRatio(request.muRatio ?? 1);
  let step = request.step ?? DEFAULT_STEP;
  if (typeof step !== 'number' || !(step > 0 && step <= 0.1))
    throw new OrbitalInputError('step', `must be in (0, 0.1], got ${String(step)}`);

  const bound = countBoundLevels(p, l, mu, step / 2);
  if (bound < levels) refuseUnbound(bound, levels, l, '');

  const fixedEnd = p.hardWall ?? p.outerLimit;
  let rEnd = initialOuterRadius(p, l, levels, mu);
  let coarse: number[] | null = null;
  // Energies of the previous attempt start the next one: extending or refining moves them little.
  let previous: number[] | null = null;
  let brackets: LevelBrackets | number = 0;
  let system: ShootingSystem | null = null;
  for (let attempt = 0; attempt < MAX_ADJUSTMENTS && !coarse; attempt++) {
    if (gridPoints(p, rEnd, step / 2) > MAX_GRID_POINTS || rEnd > MAX_OUTER_SCALES * p.lengthScale) break;
    system = radialSystem(p, l, mu, rEnd, step);
    brackets = bracketLevels(system, p, levels);
    if (typeof brackets === 'number') {
      if (fixedEnd !== undefined) refuseUnbound(brackets, levels, l, ' within the tabulated range');
      rEnd *= 2;
      continue;
    }
    const found = energiesOnGrid(system, brackets, levels, previous);
    previous = found;
    const top = found[levels - 1];
    const q = gridQuality(system, top);
    if (q.phase > MAX_PHASE_PER_STEP) {
      step *= (0.8 * MAX_PHASE_PER_STEP) / q.phase;
      continue;
    }
    if (p.hardWall === undefined && q.decay < DECAY_EXPONENT) {
      if (p.outerLimit !== undefined) {
        throw new OrbitalInputError(
          'levels',
          `level ${levelName(levels - 1, l)} (E ≈ ${top.toPrecision(6)} hartree) has not died out by the last tabulated radius ${Number(p.outerLimit.toPrecision(6))} bohr: extend the table or give asymptoticCharge`,
        );
      }
      const kappa = Math.sqrt(Math.max(2 * mu * (system.vEff[system.vEff.length - 1] - top), 0));
      const extra = kappa > 0 && !q.allowedToEnd ? (1.2 * (DECAY_EXPONENT - q.decay)) / kappa : rEnd;
      rEnd = Math.max(rEnd * 1.2, rEnd + extra);
      continue;
    }
    coarse = found;
  }
  if (!coarse || !system || typeof brackets === 'number') {
    throw new OrbitalInputError(
      'levels',
      `level ${levelName(levels - 1, l)} needs a grid beyond the limit of ${MAX_GRID_POINTS} points; ask for fewer levels`,
    );
  }

  const fine = radialSystem(p, l, mu, rEnd, step / 2);
  const upperHint = brackets.hi[levels - 1];
  const fineBrackets = bracketLevels(fine, p, levels, Number.isFinite(upperHint) ? upperHint : undefined);
  if (typeof fineBrackets === 'number') refuseUnbound(fineBrackets, levels, l, '');
  const fineLevels = statesOnGrid(fine, fineBrackets, coarse);

  const order = p.smooth ? 4 : 2;
  const denominator = 2 ** order - 1;
  const { tailCharge, originCharge } = p.asymptotes;
  const zHydrogen = tailCharge > 0 ? tailCharge : originCharge;
  const r = fine.r;
  const solved = fineLevels.map((f, k): SolvedLevel => {
    const n = k + l + 1;
    const diff = f.energy - coarse[k];
    const energy = f.energy + diff / denominator;
    const R = new Float64Array(r.length);
    for (let i = 0; i < r.length; i++) R[i] = f.u[i] / r[i];
    const level: SolvedLevel = {
      n,
      l,
      nodes: f.nodes,
      energy,
      energyEv: hartreeToEv(energy),
      error: Math.abs(diff) / denominator,
      energyFine: f.energy,
      energyCoarse: coarse[k],
      rMean: f.rMean,
      u: f.u,
      R,
    };
    if (zHydrogen > 0) {
      const eH = energyValue(n, mu * zHydrogen * zHydrogen);
      level.hydrogen = { Z: zHydrogen, energy: eH, shift: energy - eH };
      if (tailCharge > 0 && energy < 0) level.hydrogen.quantumDefect = n - tailCharge / Math.sqrt((-2 * energy) / mu);
    }
    return level;
  });
  return {
    potential: { id: p.id, label: p.label, formula: p.formula },
    l,
    muRatio: mu,
    r,
    grid: { points: r.length, step: step / 2, rMin: r[0], rMax: r[r.length - 1] },
    order,
    levels: solved,
  };
}
