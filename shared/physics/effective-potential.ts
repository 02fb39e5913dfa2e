/**
 * Effective potential of the radial equation and its bound levels, for radial-plot figures.
 *
 * Source: any quantum-mechanics text (e.g. Griffiths 2nd ed. eq. 4.38, number from memory); DESIGN.md:
 *   V_eff(r) = −Z/r + l(l+1)/(2μr²)   (hartree, r in bohr, μ in electron masses),
 * with the levels E_n = −μZ²/(2n²), n > l. Classical turning points solve V_eff(r) = E_n:
 *   E r² + Z r − l(l+1)/(2μ) = 0  →  r = [−Z ± √(Z² + 2E l(l+1)/μ)]/(2E).
 */
import { energyValue } from './energy-levels';
import { OrbitalInputError } from './orbital-input-error';
import {
  checkAngular,
  checkMassRatio,
  checkNuclearCharge,
  checkPrincipal,
  MAX_PRINCIPAL_QUANTUM_NUMBER,
} from './quantum-numbers';

export function effectivePotential(r: number, l: number, Z = 1, muRatio = 1): number {
  if (typeof r !== 'number' || !(r > 0))
    throw new OrbitalInputError('r', `radius must be > 0, got ${String(r)}`);
  const ll = checkAngular(l, null);
  const mu = checkMassRatio(muRatio);
  return -checkNuclearCharge(Z) / r + (ll * (ll + 1)) / (2 * mu * r * r);
}

export interface BoundLevel {
  n: number;
  energy: number;
  /** Classical turning points (bohr): inner is 0 for l = 0. */
  innerTurningPoint: number;
  outerTurningPoint: number;
}

export interface EffectivePotentialCurve {
  r: number[];
  V: number[];
  levels: BoundLevel[];
}

export interface EffectivePotentialRequest {
  l: number;
  Z?: number;
  muRatio?: number;
  rMin: number;
  rMax: number;
  /** Number of samples (2 … 100 000). */
  points: number;
  /** Highest n of the levels listed (default 10, at most 30). */
  nMax?: number;
  spacing?: 'linear' | 'log';
}

export const MAX_CURVE_POINTS = 100_000;

export function effectivePotentialCurve(req: EffectivePotentialRequest): EffectivePotentialCurve {
  const l = checkAngular(req.l, null);
  const Z = checkNuclearCharge(req.Z ?? 1);
  const mu = checkMassRatio(req.muRatio ?? 1);
  if (!(req.rMin > 0) || !Number.isFinite(req.rMin))
    throw new OrbitalInputError('rMin', 'must be a positive number of bohr');
  if (!(req.rMax > req.rMin) || !Number.isFinite(req.rMax))
    throw new OrbitalInputError('rMax', 'must be a finite number greater than rMin');
  if (!Number.isInteger(req.points) || req.points < 2 || req.points > MAX_CURVE_POINTS) {
    throw new OrbitalInputError('points', `must be an integer from 2 to ${MAX_CURVE_POINTS}`);
  }
  const nMax = checkPrincipal(req.nMax ?? Math.min(10, MAX_PRINCIPAL_QUANTUM_NUMBER), 'nMax');
  const r: number[] = [];
  const V: number[] = [];
  const log = req.spacing === 'log';
  for (let i = 0; i < req.points; i++) {
    const f = i / (req.points - 1);
    const ri = log
      ? req.rMin * Math.pow(req.rMax / req.rMin, f)
      : req.rMin + f * (req.rMax - req.rMin);
    r.push(ri);
    V.push(-Z / ri + (l * (l + 1)) / (2 * mu * ri * ri));
  }
  const levels: BoundLevel[] = [];
  const L = (l * (l + 1)) / mu;
  for (let n = l + 1; n <= nMax; n++) {
    const E = energyValue(n, mu * Z * Z);
    const root = Math.sqrt(Z * Z + 2 * E * L);
    // The roots multiply to −L/(2E) > 0: take the inner one from that product, which avoids cancellation.
    const outer = (-Z - root) / (2 * E);
    const inner = l === 0 ? 0 : -L / (2 * E * outer);
    levels.push({ n, energy: E, innerTurningPoint: inner, outerTurningPoint: outer });
  }
  return { r, V, levels };
}
