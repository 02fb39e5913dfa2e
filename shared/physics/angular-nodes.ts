/**
 * Angular nodal surfaces of an orbital's angular part, as data for figures: planes through the
 * nucleus (given by their unit normal) and cones about the z axis (given by their half-angle θ from +z).
 *
 * Source: for the real S_lm (REFERENCE.md §5) the factor cos mφ or sin |m|φ vanishes on |m| planes
 * containing the z axis, and P_l^{|m|}(cos θ) on l − |m| values of cos θ (the zeros of the Legendre
 * function; cos θ = 0 is the xy plane, any other zero a cone). Total: l surfaces (common knowledge).
 * A complex Y_l^m (m ≠ 0) has no azimuthal nodal planes (|e^{imφ}| = 1): only the l − |m| Legendre
 * surfaces, plus the z axis itself, which is a line, not a surface, and is not listed.
 *
 * Method: the Legendre zeros in t = cos θ are found by interlacing + bisection on the normalised
 * recurrence (the Q̄_{m+j}^m, j = 0, 1, … are orthogonal polynomials in t for weight (1 − t²)^m).
 */
import type { Basis } from './orbital-state';
import { bisectRoot } from './laguerre-zeros';
import { solidHarmonicPlan, zonalFactor } from './solid-harmonic';
import { checkAngular, checkMagnetic } from './quantum-numbers';

export interface NodalPlane {
  kind: 'plane';
  /** Unit normal in the physics frame (./coordinates). */
  normal: [number, number, number];
}

export interface NodalCone {
  kind: 'cone';
  /** Half-angle θ (radians) of the cone about +z: the surface cos θ = cosTheta. */
  halfAngle: number;
  cosTheta: number;
}

export interface AngularNodes {
  /** Number of angular nodal surfaces (= l for real orbitals, l − |m| for complex ones). */
  count: number;
  planes: NodalPlane[];
  cones: NodalCone[];
}

/** Below this size a component of a plane normal is an artefact of rounding sin/cos of multiples of π. */
const ROUNDING_FLOOR = 1e-15;
const clean = (v: number): number => (Math.abs(v) < ROUNDING_FLOOR ? 0 : v);

/** Zeros in (−1, 1) of P_l^m(t), ascending. */
export function legendreZeros(l: number, m: number): number[] {
  let zeros: number[] = [];
  for (let deg = m + 1; deg <= l; deg++) {
    const plan = solidHarmonicPlan(deg, m, false);
    const f = (t: number): number => zonalFactor(plan, t, 1);
    const edges = [-1, ...zeros, 1];
    const next: number[] = [];
    for (let i = 0; i + 1 < edges.length; i++) next.push(bisectRoot(f, edges[i], edges[i + 1]));
    zeros = next.map((t) => (Math.abs(t) < ROUNDING_FLOOR ? 0 : t));
  }
  return zeros;
}

function azimuthalPlanes(m: number): NodalPlane[] {
  const mAbs = Math.abs(m);
  const planes: NodalPlane[] = [];
  for (let j = 0; j < mAbs; j++) {
    // cos mφ vanishes at φ = (2j+1)π/(2m); sin |m|φ at φ = jπ/|m|. The plane through z at azimuth φ has normal (−sin φ, cos φ, 0).
    const phi = m > 0 ? ((2 * j + 1) * Math.PI) / (2 * mAbs) : (j * Math.PI) / mAbs;
    let nx = clean(-Math.sin(phi));
    let ny = clean(Math.cos(phi));
    if (nx < 0 || (nx === 0 && ny < 0)) {
      nx = -nx;
      ny = -ny;
    }
    planes.push({ kind: 'plane', normal: [nx + 0, ny + 0, 0] });
  }
  return planes;
}

export function angularNodes(l: number, m: number, basis: Basis): AngularNodes {
  const ll = checkAngular(l, null);
  const mm = checkMagnetic(m, ll);
  const planes: NodalPlane[] = basis === 'real' ? azimuthalPlanes(mm) : [];
  const cones: NodalCone[] = [];
  for (const t of legendreZeros(ll, Math.abs(mm))) {
    if (t === 0) planes.push({ kind: 'plane', normal: [0, 0, 1] });
    else cones.push({ kind: 'cone', halfAngle: Math.acos(t), cosTheta: t });
  }
  return { count: planes.length + cones.length, planes, cones };
}
