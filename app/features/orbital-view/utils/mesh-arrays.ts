// Triangle meshes and point sets in the three.js frame, as plain typed arrays that cross the worker boundary.
import { physicsToThree, type Vec3 } from '../../../../shared/physics/coordinates';

export interface MeshArrays {
  /** x, y, z per vertex, bohr, three.js frame (y up). */
  readonly positions: Float32Array;
  /** Unit normal per vertex, three.js frame. */
  readonly normals: Float32Array;
  readonly indices: Uint32Array;
  /** arg ψ per vertex (complex states), for colouring by phase; null when one colour fits. */
  readonly phases: Float32Array | null;
}

const scratch: Vec3 = { x: 0, y: 0, z: 0 };

/** Rewrites triples (x, y, z) of the physics frame, in place, into the three.js frame. */
export function physicsTriplesToThree(values: Float32Array): Float32Array {
  for (let i = 0; i < values.length; i += 3) {
    physicsToThree(values[i], values[i + 1], values[i + 2], scratch);
    values[i] = scratch.x;
    values[i + 1] = scratch.y;
    values[i + 2] = scratch.z;
  }
  return values;
}

/** Area-weighted vertex normals of an indexed mesh (counter-clockwise faces point outward). */
export function vertexNormals(positions: Float32Array, indices: Uint32Array): Float32Array {
  const normals = new Float32Array(positions.length);
  for (let t = 0; t < indices.length; t += 3) {
    const a = 3 * indices[t];
    const b = 3 * indices[t + 1];
    const c = 3 * indices[t + 2];
    const ux = positions[b] - positions[a];
    const uy = positions[b + 1] - positions[a + 1];
    const uz = positions[b + 2] - positions[a + 2];
    const vx = positions[c] - positions[a];
    const vy = positions[c + 1] - positions[a + 1];
    const vz = positions[c + 2] - positions[a + 2];
    const nx = uy * vz - uz * vy;
    const ny = uz * vx - ux * vz;
    const nz = ux * vy - uy * vx;
    for (const v of [a, b, c]) {
      normals[v] += nx;
      normals[v + 1] += ny;
      normals[v + 2] += nz;
    }
  }
  for (let i = 0; i < normals.length; i += 3) {
    const length = Math.hypot(normals[i], normals[i + 1], normals[i + 2]);
    if (length > 0) {
      normals[i] /= length;
      normals[i + 1] /= length;
      normals[i + 2] /= length;
    }
  }
  return normals;
}

/** Buffers to hand to postMessage's transfer list. */
export function meshBuffers(mesh: MeshArrays): ArrayBuffer[] {
  const list = [mesh.positions.buffer, mesh.normals.buffer, mesh.indices.buffer] as ArrayBuffer[];
  if (mesh.phases) list.push(mesh.phases.buffer as ArrayBuffer);
  return list;
}
