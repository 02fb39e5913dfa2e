/**
 * Thin sheets that show the angular nodal surfaces of a single orbital: a disc for each nodal
 * plane and a cone (one nappe, apex at the nucleus) for each nodal cone, all of one radius, in the
 * three.js frame. The planes and cones themselves come from shared/physics angular-nodes.
 */
import type { AngularNodes } from '../../../../shared/physics/angular-nodes';
import { physicsTriplesToThree, type MeshArrays } from './mesh-arrays';

const SEGMENTS = 96;

export function buildNodalSheets(nodes: AngularNodes, radius: number): MeshArrays | null {
  if (nodes.count === 0) return null;
  const positions: number[] = [];
  const normals: number[] = [];
  const indices: number[] = [];
  for (const plane of nodes.planes) {
    const [nx, ny, nz] = plane.normal;
    // Two unit vectors spanning the plane: u ⟂ n from the axis n is least aligned with, v = n × u.
    const helper = Math.abs(nx) < 0.9 ? [1, 0, 0] : [0, 1, 0];
    let ux = ny * helper[2] - nz * helper[1];
    let uy = nz * helper[0] - nx * helper[2];
    let uz = nx * helper[1] - ny * helper[0];
    const ul = Math.hypot(ux, uy, uz);
    ux /= ul;
    uy /= ul;
    uz /= ul;
    const vx = ny * uz - nz * uy;
    const vy = nz * ux - nx * uz;
    const vz = nx * uy - ny * ux;
    const centre = positions.length / 3;
    positions.push(0, 0, 0);
    normals.push(nx, ny, nz);
    for (let s = 0; s < SEGMENTS; s++) {
      const a = (2 * Math.PI * s) / SEGMENTS;
      const c = Math.cos(a) * radius;
      const d = Math.sin(a) * radius;
      positions.push(ux * c + vx * d, uy * c + vy * d, uz * c + vz * d);
      normals.push(nx, ny, nz);
      indices.push(centre, centre + 1 + s, centre + 1 + ((s + 1) % SEGMENTS));
    }
  }
  for (const cone of nodes.cones) {
    const st = Math.sin(cone.halfAngle);
    const ct = Math.cos(cone.halfAngle);
    const apex = positions.length / 3;
    positions.push(0, 0, 0);
    normals.push(0, 0, ct >= 0 ? 1 : -1);
    for (let s = 0; s < SEGMENTS; s++) {
      const phi = (2 * Math.PI * s) / SEGMENTS;
      const cx = Math.cos(phi);
      const cy = Math.sin(phi);
      positions.push(radius * st * cx, radius * st * cy, radius * ct);
      // Normal of the cone θ = const: the unit θ̂ direction, up to sign.
      normals.push(ct * cx, ct * cy, -st);
      indices.push(apex, apex + 1 + s, apex + 1 + ((s + 1) % SEGMENTS));
    }
  }
  return {
    positions: physicsTriplesToThree(Float32Array.from(positions)),
    normals: physicsTriplesToThree(Float32Array.from(normals)),
    indices: Uint32Array.from(indices),
    phases: null,
  };
}
