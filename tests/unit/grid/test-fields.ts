// Closed-form hydrogen wavefunctions sampled on a grid, and mesh topology measures, for the grid tests.
// ψ_1s = e^{−r}/√π and ψ_2p_z = z e^{−r/2}/(4√(2π)) (Z = 1, bohr): Griffiths, Introduction to Quantum
// Mechanics, 2nd ed., §4.2 (equation numbers from memory); both agree with REFERENCE.md §6.
import type { GridSpec } from '../../../shared/grid/grid-spec';
import type { TriangleMesh } from '../../../shared/grid/triangle-mesh';

export const psi1s = (x: number, y: number, z: number): number => Math.exp(-Math.hypot(x, y, z)) / Math.sqrt(Math.PI);
export const psi2pz = (x: number, y: number, z: number): number =>
  (z * Math.exp(-Math.hypot(x, y, z) / 2)) / (4 * Math.sqrt(2 * Math.PI));

/** f sampled at every grid point, index i + n·(j + n·k). */
export function sampleField(grid: GridSpec, f: (x: number, y: number, z: number) => number): Float32Array {
  const { n, half } = grid;
  const h = (2 * half) / (n - 1);
  const out = new Float32Array(n * n * n);
  for (let k = 0; k < n; k++)
    for (let j = 0; j < n; j++)
      for (let i = 0; i < n; i++) out[i + n * (j + n * k)] = f(-half + i * h, -half + j * h, -half + k * h);
  return out;
}

/** Number of triangles using each undirected edge, keyed "a,b" with a < b. */
export function edgeUse(mesh: TriangleMesh): Map<string, number> {
  const use = new Map<string, number>();
  const { indices } = mesh;
  for (let t = 0; t < indices.length; t += 3) {
    for (let s = 0; s < 3; s++) {
      const a = indices[t + s];
      const b = indices[t + ((s + 1) % 3)];
      const key = a < b ? `${a},${b}` : `${b},${a}`;
      use.set(key, (use.get(key) ?? 0) + 1);
    }
  }
  return use;
}

/** Connected components of the mesh (vertices joined by triangles), by union–find. */
export function componentCount(mesh: TriangleMesh): number {
  const parent = Int32Array.from({ length: mesh.vertexCount }, (_, i) => i);
  const root = (v: number): number => {
    while (parent[v] !== v) v = parent[v] = parent[parent[v]];
    return v;
  };
  for (let t = 0; t < mesh.indices.length; t += 3) {
    const a = root(mesh.indices[t]);
    parent[root(mesh.indices[t + 1])] = a;
    parent[root(mesh.indices[t + 2])] = a;
  }
  let count = 0;
  for (let v = 0; v < mesh.vertexCount; v++) if (root(v) === v) count++;
  return count;
}

export function eulerCharacteristic(mesh: TriangleMesh): number {
  return mesh.vertexCount - edgeUse(mesh).size + mesh.triangleCount;
}
