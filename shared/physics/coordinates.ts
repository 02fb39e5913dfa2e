/**
 * Coordinate conventions of Lobewright, and the only place that converts between them.
 *
 * Physics frame (all of shared/physics): right-handed Cartesian (x, y, z) in bohr, nucleus at the
 * origin; spherical angles as in ISO 80000-2 and REFERENCE.md §0: θ ∈ [0, π] is the polar angle
 * measured from +z, φ ∈ (−π, π] the azimuth measured from +x toward +y.
 *
 * three.js frame (the 3D viewer and print renderer): right-handed with +y up. We keep the physics
 * +z axis pointing up on screen, so
 *   three (X, Y, Z) = physics (x, z, −y),   physics (x, y, z) = three (X, −Z, Y).
 * (A rotation by −90° about x: handedness is kept, and p_z lobes point up.)
 */

export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

export interface Spherical {
  r: number;
  theta: number;
  phi: number;
}

export function cartesianToSpherical(
  x: number,
  y: number,
  z: number,
  out: Spherical = { r: 0, theta: 0, phi: 0 },
): Spherical {
  const rho = Math.hypot(x, y);
  out.r = Math.hypot(rho, z);
  out.theta = Math.atan2(rho, z);
  out.phi = Math.atan2(y, x);
  return out;
}

export function sphericalToCartesian(
  r: number,
  theta: number,
  phi: number,
  out: Vec3 = { x: 0, y: 0, z: 0 },
): Vec3 {
  const s = Math.sin(theta);
  out.x = r * s * Math.cos(phi);
  out.y = r * s * Math.sin(phi);
  out.z = r * Math.cos(theta);
  return out;
}

export function physicsToThree(
  x: number,
  y: number,
  z: number,
  out: Vec3 = { x: 0, y: 0, z: 0 },
): Vec3 {
  out.x = x;
  out.y = z;
  out.z = 0 - y; // 0 − y, not −y: no negative zero in the output
  return out;
}

export function threeToPhysics(
  x: number,
  y: number,
  z: number,
  out: Vec3 = { x: 0, y: 0, z: 0 },
): Vec3 {
  out.x = x;
  out.y = 0 - z;
  out.z = y;
  return out;
}

/** Index of grid point (i, j, k) in a cube of n points per axis, x fastest (shared with shared/grid). */
export function gridIndex(n: number, i: number, j: number, k: number): number {
  return i + n * (j + n * k);
}
