/**
 * Lays the logarithmic grid for a potential and one l and sets up the Numerov system on it: where the
 * grid starts (far inside the nucleus' neighbourhood), where it ends, and V on every point.
 */
import { logGrid } from './log-grid';
import { shootingSystem, type ShootingSystem } from './numerov-shooting';
import type { Potential } from './potential';

/**
 * First radius as a fraction of the inner length scale: the regular start u ∝ r^{l+1}(1 − Z₀r/(l+1))
 * is then exact to ~(Z₀ r)² ≈ 1e-12 there, far below the discretisation error.
 */
const INNER_FRACTION = 1e-6;

export function innerRadius(potential: Potential): number {
  if (potential.innerLimit !== undefined) return potential.innerLimit;
  const z0 = potential.asymptotes.originCharge;
  const inner = z0 > 0 ? Math.min(potential.lengthScale, 1 / z0) : potential.lengthScale;
  return INNER_FRACTION * inner;
}

/** Number of points of a grid from innerRadius to rEnd at this step (for limits before allocating). */
export function gridPoints(potential: Potential, rEnd: number, step: number): number {
  return Math.ceil(Math.log(rEnd / innerRadius(potential)) / step) + 2;
}

export function radialSystem(
  potential: Potential,
  l: number,
  mu: number,
  rEnd: number,
  step: number,
): ShootingSystem {
  const { r } = logGrid(innerRadius(potential), rEnd, step, potential.breakpoint);
  const V = new Float64Array(r.length);
  for (let i = 0; i < r.length; i++) V[i] = potential.evaluate(r[i]);
  const { breakpoint, jump } = potential;
  const index = jump && breakpoint !== undefined ? r.indexOf(breakpoint) : -1;
  const jumpAt = jump && index > 1 && index < r.length - 2 ? { index, ...jump } : undefined;
  return shootingSystem(r, step, V, l, mu, potential.asymptotes.originCharge, jumpAt);
}
