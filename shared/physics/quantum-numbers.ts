/**
 * Guard clauses for quantum numbers and nuclear charge, shared by every public physics function.
 * Bad input throws OrbitalInputError naming the field (decided once for the whole module).
 */
import { MAX_NUCLEAR_CHARGE } from './constants';
import { OrbitalInputError } from './orbital-input-error';

/** Largest principal quantum number for which accuracy is tested (fixtures go to n = 30). */
export const MAX_PRINCIPAL_QUANTUM_NUMBER = 30;
/** Largest angular momentum for spherical harmonics on their own (tested to l = 30). */
export const MAX_ANGULAR_MOMENTUM = 30;

function requireInteger(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new OrbitalInputError(field, 'must be a finite number');
  if (!Number.isInteger(value))
    throw new OrbitalInputError(field, `must be an integer, got ${value}`);
  return value;
}

export function checkPrincipal(n: unknown, field = 'n'): number {
  const v = requireInteger(n, field);
  if (v < 1) throw new OrbitalInputError(field, `n must be at least 1, got ${v}`);
  if (v > MAX_PRINCIPAL_QUANTUM_NUMBER) {
    throw new OrbitalInputError(
      field,
      `n must be at most ${MAX_PRINCIPAL_QUANTUM_NUMBER}, got ${v}`,
    );
  }
  return v;
}

/** l with 0 ≤ l < n (or l ≤ MAX_ANGULAR_MOMENTUM when n is not given). */
export function checkAngular(l: unknown, n: number | null, field = 'l'): number {
  const v = requireInteger(l, field);
  if (v < 0) throw new OrbitalInputError(field, `l must not be negative, got ${v}`);
  if (n !== null && v >= n)
    throw new OrbitalInputError(field, `l must be less than n = ${n}, got ${v}`);
  if (v > MAX_ANGULAR_MOMENTUM)
    throw new OrbitalInputError(field, `l must be at most ${MAX_ANGULAR_MOMENTUM}, got ${v}`);
  return v;
}

export function checkMagnetic(m: unknown, l: number, field = 'm'): number {
  const v = requireInteger(m, field);
  if (Math.abs(v) > l) throw new OrbitalInputError(field, `|m| must not exceed l = ${l}, got ${v}`);
  return v;
}

export function checkNuclearCharge(Z: unknown, field = 'Z'): number {
  const v = requireInteger(Z, field);
  if (v < 1 || v > MAX_NUCLEAR_CHARGE) {
    throw new OrbitalInputError(field, `Z must be between 1 and ${MAX_NUCLEAR_CHARGE}, got ${v}`);
  }
  return v;
}

/** Reduced-mass ratio μ/m_e, which must lie in (0, 1]. */
export function checkMassRatio(mu: unknown, field = 'muRatio'): number {
  if (typeof mu !== 'number' || !Number.isFinite(mu) || mu <= 0 || mu > 1) {
    throw new OrbitalInputError(
      field,
      `reduced-mass ratio μ/m_e must be in (0, 1], got ${String(mu)}`,
    );
  }
  return mu;
}

export function checkRadius(r: unknown, field = 'r'): number {
  if (typeof r !== 'number' || Number.isNaN(r) || r < 0) {
    throw new OrbitalInputError(field, `radius must be a number ≥ 0, got ${String(r)}`);
  }
  return r;
}

export function checkFinite(v: unknown, field: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v))
    throw new OrbitalInputError(field, 'must be a finite number');
  return v;
}

/** l, m and a direction (θ, φ) in radians, validated together for the angular functions. */
export function checkDirection(
  l: unknown,
  m: unknown,
  theta: unknown,
  phi: unknown,
): { l: number; m: number; theta: number; phi: number } {
  const ll = checkAngular(l, null);
  return {
    l: ll,
    m: checkMagnetic(m, ll),
    theta: checkFinite(theta, 'theta'),
    phi: checkFinite(phi, 'phi'),
  };
}
