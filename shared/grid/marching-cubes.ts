/**
 * Marching cubes: the indexed triangle mesh of the surface sign·f = isovalue of a field f sampled
 * on a GridSpec grid, enclosing the region sign·f ≥ isovalue, with smooth vertex normals and, for
 * complex states, the phase arg ψ at each vertex.
 *
 * Method: W. E. Lorensen and H. E. Cline, Computer Graphics 21(4), 163–169 (1987), with the
 * public-domain case table of P. Bourke / C. G. Bloyd (see marching-cubes-tables.ts). Vertices
 * lie on grid edges, placed by linear interpolation of f; each grid edge gets at most one vertex,
 * shared by all cubes around it (found through edge caches covering one slab of cubes, so memory
 * is O(n²) beyond the mesh). Normals: −∇(sign·f) from central differences at the two edge ends
 * (one-sided at the grid boundary), interpolated like the position, so they point out of the
 * region. Phase: Re ψ and Im ψ interpolated along the edge, then atan2 (interpolating the angle
 * itself would break at the ±π cut).
 *
 * Accuracy: vertices lie within one grid spacing of the true surface, typically much closer
 * (linear interpolation error O(h²·f''/f')). Surfaces that reach the grid boundary are left open
 * there. Bourke's table resolves ambiguous faces by the corner pattern of that face alone, so
 * neighbouring cubes agree and surfaces inside the grid come out closed.
 *
 * Where the time goes: the loop over all (n−1)³ cubes reading eight samples each; cubes that the
 * surface crosses are a small fraction, and there the gradient reads dominate.
 */
import { OrbitalInputError } from '../physics/orbital-input-error';
import { gridSpacing, type GridSpec } from './grid-spec';
import { EDGE_MASK, TRIANGLE_EDGES } from './marching-cubes-tables';
import { TriangleMeshBuilder, type TriangleMesh } from './triangle-mesh';

export const DEFAULT_MAX_TRIANGLES = 2_000_000;

export interface MarchingCubesOptions {
  /** The surface is sign·f = isovalue. */
  isovalue: number;
  /** −1 meshes f = −isovalue around the region f ≤ −isovalue (the negative phase of ψ). */
  sign?: 1 | -1;
  /** Refuse meshes with more triangles than this (default DEFAULT_MAX_TRIANGLES). */
  maxTriangles?: number;
  /** Re ψ and Im ψ on the same grid, to give each vertex its phase arg ψ. */
  phase?: { re: Float32Array; im: Float32Array };
}

// Per cube edge: the corner at its lower end (dx, dy, dz) and the axis it runs along.
const EDGE_DX = Int8Array.of(0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 1, 0);
const EDGE_DY = Int8Array.of(0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 1);
const EDGE_DZ = Int8Array.of(0, 0, 0, 0, 1, 1, 1, 1, 0, 0, 0, 0);
const EDGE_AXIS = Int8Array.of(0, 1, 0, 1, 0, 1, 0, 1, 2, 2, 2, 2);

export function marchingCubes(field: Float32Array, grid: GridSpec, options: MarchingCubesOptions): TriangleMesh {
  const { n } = grid;
  const nn = n * n;
  if (field.length !== nn * n) {
    throw new OrbitalInputError('field', `has ${field.length} samples; a grid of n = ${n} needs ${nn * n}`);
  }
  const iso = options.isovalue;
  if (!Number.isFinite(iso)) throw new OrbitalInputError('isovalue', `must be a finite number, got ${iso}`);
  const sign = options.sign ?? 1;
  const maxTriangles = options.maxTriangles ?? DEFAULT_MAX_TRIANGLES;
  if (!Number.isInteger(maxTriangles) || maxTriangles < 1) {
    throw new OrbitalInputError('maxTriangles', `must be a positive integer, got ${maxTriangles}`);
  }
  const phase = options.phase ?? null;
  if (phase && (phase.re.length !== field.length || phase.im.length !== field.length)) {
    throw new OrbitalInputError('phase', 'Re ψ and Im ψ must have as many samples as the field');
  }

  const h = gridSpacing(grid);
  const strides = [1, n, nn];
  const mesh = new TriangleMeshBuilder(phase !== null);
  const gradA = new Float64Array(3);
  const gradB = new Float64Array(3);

  // One component of ∇(sign·f) at sample p, index c along an axis of stride s: central difference
  // inside, one-sided on the grid's faces.
  const derivative = (p: number, c: number, s: number): number => {
    if (c > 0 && c < n - 1) return (sign * (field[p + s] - field[p - s])) / (2 * h);
    return c > 0 ? (sign * (field[p] - field[p - s])) / h : (sign * (field[p + s] - field[p])) / h;
  };
  const gradient = (i: number, j: number, k: number, out: Float64Array): void => {
    const p = i + n * (j + n * k);
    out[0] = derivative(p, i, 1);
    out[1] = derivative(p, j, n);
    out[2] = derivative(p, k, nn);
  };

  const makeVertex = (i: number, j: number, k: number, axis: number): number => {
    const pA = i + n * (j + n * k);
    const pB = pA + strides[axis];
    const fA = sign * field[pA];
    const fB = sign * field[pB];
    const t = (iso - fA) / (fB - fA);
    gradient(i, j, k, gradA);
    gradient(axis === 0 ? i + 1 : i, axis === 1 ? j + 1 : j, axis === 2 ? k + 1 : k, gradB);
    let phaseAngle = 0;
    if (phase) {
      const re = phase.re[pA] + t * (phase.re[pB] - phase.re[pA]);
      const im = phase.im[pA] + t * (phase.im[pB] - phase.im[pA]);
      phaseAngle = Math.atan2(im, re);
    }
    return mesh.addVertex(
      -grid.half + (i + (axis === 0 ? t : 0)) * h,
      -grid.half + (j + (axis === 1 ? t : 0)) * h,
      -grid.half + (k + (axis === 2 ? t : 0)) * h,
      -(gradA[0] + t * (gradB[0] - gradA[0])),
      -(gradA[1] + t * (gradB[1] - gradA[1])),
      -(gradA[2] + t * (gradB[2] - gradA[2])),
      phaseAngle,
    );
  };

  // Vertex ids of grid edges: x- and y-edges in the slab's bottom and top planes, z-edges between.
  let xBottom = new Int32Array(nn).fill(-1);
  let yBottom = new Int32Array(nn).fill(-1);
  let xTop = new Int32Array(nn);
  let yTop = new Int32Array(nn);
  const zMiddle = new Int32Array(nn);
  const cubeVertex = new Int32Array(12);

  for (let k = 0; k < n - 1; k++) {
    xTop.fill(-1);
    yTop.fill(-1);
    zMiddle.fill(-1);
    for (let j = 0; j < n - 1; j++) {
      for (let i = 0; i < n - 1; i++) {
        const p = i + n * (j + n * k);
        let cube = 0;
        if (sign * field[p] < iso) cube |= 1;
        if (sign * field[p + 1] < iso) cube |= 2;
        if (sign * field[p + 1 + n] < iso) cube |= 4;
        if (sign * field[p + n] < iso) cube |= 8;
        if (sign * field[p + nn] < iso) cube |= 16;
        if (sign * field[p + 1 + nn] < iso) cube |= 32;
        if (sign * field[p + 1 + n + nn] < iso) cube |= 64;
        if (sign * field[p + n + nn] < iso) cube |= 128;
        const edges = EDGE_MASK[cube];
        if (edges === 0) continue;

        for (let e = 0; e < 12; e++) {
          if ((edges & (1 << e)) === 0) continue;
          const di = EDGE_DX[e];
          const dj = EDGE_DY[e];
          const dk = EDGE_DZ[e];
          const axis = EDGE_AXIS[e];
          const q = i + di + n * (j + dj);
          const cache = axis === 2 ? zMiddle : axis === 0 ? (dk ? xTop : xBottom) : dk ? yTop : yBottom;
          let v = cache[q];
          if (v < 0) {
            v = makeVertex(i + di, j + dj, k + dk, axis);
            cache[q] = v;
          }
          cubeVertex[e] = v;
        }

        const base = 16 * cube;
        let count = 0;
        while (count < 15 && TRIANGLE_EDGES[base + count] >= 0) count += 3;
        if (mesh.triangleCount + count / 3 > maxTriangles) {
          throw new OrbitalInputError(
            'maxTriangles',
            `the surface needs more than ${maxTriangles} triangles; use a coarser grid or raise the limit`,
          );
        }
        // With "below" corners as set bits, Bourke's triangles run counter-clockwise seen from outside.
        for (let t = 0; t < count; t += 3) {
          mesh.addTriangle(
            cubeVertex[TRIANGLE_EDGES[base + t]],
            cubeVertex[TRIANGLE_EDGES[base + t + 1]],
            cubeVertex[TRIANGLE_EDGES[base + t + 2]],
          );
        }
      }
    }
    [xBottom, xTop] = [xTop, xBottom];
    [yBottom, yTop] = [yTop, yBottom];
  }
  return mesh.finish();
}
