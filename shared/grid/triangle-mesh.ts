/**
 * An indexed triangle mesh in typed arrays, ready for a three.js BufferGeometry (positions,
 * normals and indices as given; three.js treats counter-clockwise triangles as front faces), plus
 * a growable builder used while meshing, when the final size is not yet known.
 */
export interface TriangleMesh {
  /** x, y, z per vertex, bohr. */
  readonly positions: Float32Array;
  /** Unit normal per vertex, pointing out of the enclosed region. */
  readonly normals: Float32Array;
  /** Three vertex indices per triangle, counter-clockwise seen from outside. */
  readonly indices: Uint32Array;
  /** arg ψ per vertex in radians, (−π, π], for meshes of complex states; null otherwise. */
  readonly phases: Float32Array | null;
  readonly vertexCount: number;
  readonly triangleCount: number;
}

function grown<T extends Float32Array | Uint32Array>(array: T, needed: number): T {
  if (needed <= array.length) return array;
  let size = array.length * 2;
  while (size < needed) size *= 2;
  const bigger = new (array.constructor as new (length: number) => T)(size);
  bigger.set(array);
  return bigger;
}

/** Appends vertices and triangles, doubling its arrays as needed; `finish` trims to size. */
export class TriangleMeshBuilder {
  private positions: Float32Array;
  private normals: Float32Array;
  private phases: Float32Array | null;
  private indices: Uint32Array;
  vertexCount = 0;
  triangleCount = 0;

  constructor(withPhases: boolean, initialVertices = 4096) {
    this.positions = new Float32Array(3 * initialVertices);
    this.normals = new Float32Array(3 * initialVertices);
    this.phases = withPhases ? new Float32Array(initialVertices) : null;
    this.indices = new Uint32Array(6 * initialVertices);
  }

  /** Adds a vertex and returns its index; the normal is normalised here (zero stays zero). */
  addVertex(x: number, y: number, z: number, nx: number, ny: number, nz: number, phase: number): number {
    const v = this.vertexCount++;
    this.positions = grown(this.positions, 3 * this.vertexCount);
    this.normals = grown(this.normals, 3 * this.vertexCount);
    const length = Math.hypot(nx, ny, nz);
    const scale = length > 0 ? 1 / length : 0;
    const o = 3 * v;
    this.positions[o] = x;
    this.positions[o + 1] = y;
    this.positions[o + 2] = z;
    this.normals[o] = nx * scale;
    this.normals[o + 1] = ny * scale;
    this.normals[o + 2] = nz * scale;
    if (this.phases) {
      this.phases = grown(this.phases, this.vertexCount);
      this.phases[v] = phase;
    }
    return v;
  }

  addTriangle(a: number, b: number, c: number): void {
    const o = 3 * this.triangleCount++;
    this.indices = grown(this.indices, o + 3);
    this.indices[o] = a;
    this.indices[o + 1] = b;
    this.indices[o + 2] = c;
  }

  finish(): TriangleMesh {
    return {
      positions: this.positions.slice(0, 3 * this.vertexCount),
      normals: this.normals.slice(0, 3 * this.vertexCount),
      indices: this.indices.slice(0, 3 * this.triangleCount),
      phases: this.phases ? this.phases.slice(0, this.vertexCount) : null,
      vertexCount: this.vertexCount,
      triangleCount: this.triangleCount,
    };
  }
}
