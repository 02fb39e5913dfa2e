/**
 * Planes through the nucleus for slices, and their in-plane axes u (right) and v (up).
 *
 * Convention (Lobewright's own): u × v = N, the unit normal, which points toward the viewer, so a
 * slice drawn with u to the right and v up is the plane seen from the +N side. v is the direction
 * of +z projected into the plane ("up is z" wherever the plane contains a z component); when the
 * plane is perpendicular to z, v = +y and u = ±x. The named planes follow textbook figures:
 *   xy: u = +x, v = +y (N = +z);   xz: u = +x, v = +z (N = −y);   yz: u = +y, v = +z (N = +x).
 * Vectors are in the physics frame of shared/physics/coordinates.ts (bohr, right-handed, z up).
 */
import { OrbitalInputError } from '../physics/orbital-input-error';

export type Vector3 = readonly [number, number, number];
export type NamedPlane = 'xy' | 'xz' | 'yz';
export type SlicePlane = NamedPlane | { readonly normal: Vector3 };

export interface SliceAxes {
  readonly u: Vector3;
  readonly v: Vector3;
  readonly normal: Vector3;
}

const NAMED_NORMALS: Record<NamedPlane, Vector3> = { xy: [0, 0, 1], xz: [0, -1, 0], yz: [1, 0, 0] };
/** A normal within about 0.0008° of ±z counts as perpendicular to z. */
const PARALLEL_TO_Z = 1e-10;

const cross = (a: Vector3, b: Vector3): Vector3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
const unit = (a: Vector3): Vector3 => {
  const length = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / length, a[1] / length, a[2] / length];
};

export function slicePlaneAxes(plane: SlicePlane): SliceAxes {
  let normal: Vector3;
  if (typeof plane === 'string') {
    if (!(plane in NAMED_NORMALS)) throw new OrbitalInputError('plane', `must be "xy", "xz", "yz" or { normal: [x, y, z] }, got "${plane}"`);
    normal = NAMED_NORMALS[plane];
  } else {
    const given = plane?.normal;
    if (!Array.isArray(given) || given.length !== 3 || !given.every((c) => typeof c === 'number' && Number.isFinite(c))) {
      throw new OrbitalInputError('plane.normal', 'must be three finite numbers [x, y, z]');
    }
    if (Math.hypot(given[0], given[1], given[2]) === 0) throw new OrbitalInputError('plane.normal', 'must not be the zero vector');
    normal = unit(given as Vector3);
  }
  const zIn: Vector3 = [-normal[2] * normal[0], -normal[2] * normal[1], 1 - normal[2] * normal[2]];
  const v: Vector3 = Math.hypot(zIn[0], zIn[1], zIn[2]) > PARALLEL_TO_Z ? unit(zIn) : [0, 1, 0];
  return { u: cross(v, normal), v, normal };
}
