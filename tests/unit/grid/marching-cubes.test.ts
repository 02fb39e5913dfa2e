// Marching cubes against surfaces known in closed form: a sphere (a level set of ψ_1s) and the two
// lobes of 2p_z. Table check: Bourke's published edge masks (paulbourke.net/geometry/polygonise/).
import { describe, expect, it } from 'vitest';
import { marchingCubes } from '../../../shared/grid/marching-cubes';
import { EDGE_MASK, TRIANGLE_EDGES } from '../../../shared/grid/marching-cubes-tables';
import type { TriangleMesh } from '../../../shared/grid/triangle-mesh';
import { componentCount, edgeUse, eulerCharacteristic, psi1s, psi2pz, sampleField } from './test-fields';

const grid = { n: 48, half: 6 };
const h = (2 * grid.half) / (grid.n - 1);

function triangleNormalsOutward(mesh: TriangleMesh, centre: [number, number, number]): number {
  const p = mesh.positions;
  let outward = 0;
  for (let t = 0; t < mesh.indices.length; t += 3) {
    const [a, b, c] = [3 * mesh.indices[t], 3 * mesh.indices[t + 1], 3 * mesh.indices[t + 2]];
    const u = [p[b] - p[a], p[b + 1] - p[a + 1], p[b + 2] - p[a + 2]];
    const v = [p[c] - p[a], p[c + 1] - p[a + 1], p[c + 2] - p[a + 2]];
    const nrm = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
    const g = [0, 1, 2].map((d) => (p[a + d] + p[b + d] + p[c + d]) / 3 - centre[d]);
    if (nrm[0] * g[0] + nrm[1] * g[1] + nrm[2] * g[2] > 0) outward++;
  }
  return outward;
}

describe('marching cubes tables', () => {
  it('derive the edge masks Bourke publishes (first row and row three of his edgeTable)', () => {
    expect(Array.from(EDGE_MASK.slice(0, 8))).toEqual([0x0, 0x109, 0x203, 0x30a, 0x406, 0x50f, 0x605, 0x70c]);
    expect(Array.from(EDGE_MASK.slice(16, 24))).toEqual([0x190, 0x99, 0x393, 0x29a, 0x596, 0x49f, 0x795, 0x69c]);
  });
  it('give complementary corner patterns the same crossed edges, and at most five triangles', () => {
    for (let c = 0; c < 256; c++) {
      expect(EDGE_MASK[c]).toBe(EDGE_MASK[255 - c]);
      expect(TRIANGLE_EDGES[16 * c + 15]).toBe(-1);
    }
  });
});

describe('marching cubes on a sphere (ψ_1s = ψ_1s(R), R = 2.5 bohr)', () => {
  const R = 2.5;
  const field = sampleField(grid, psi1s);
  const mesh = marchingCubes(field, grid, { isovalue: psi1s(R, 0, 0) });

  it('puts every vertex at radius R within h/2', () => {
    let worst = 0;
    for (let v = 0; v < mesh.vertexCount; v++) {
      const r = Math.hypot(mesh.positions[3 * v], mesh.positions[3 * v + 1], mesh.positions[3 * v + 2]);
      worst = Math.max(worst, Math.abs(r - R));
    }
    expect(mesh.vertexCount).toBeGreaterThan(1000);
    expect(worst).toBeLessThan(h / 2);
  });

  it('is one closed surface: every edge in exactly two triangles, Euler characteristic 2', () => {
    const counts = new Set(edgeUse(mesh).values());
    expect([...counts]).toEqual([2]);
    expect(eulerCharacteristic(mesh)).toBe(2);
    expect(componentCount(mesh)).toBe(1);
  });

  it('shares vertices between cubes: no two vertices at the same place', () => {
    const seen = new Set<string>();
    for (let v = 0; v < mesh.vertexCount; v++) seen.add(Array.from(mesh.positions.slice(3 * v, 3 * v + 3)).join());
    expect(seen.size).toBe(mesh.vertexCount);
  });

  it('has unit vertex normals pointing outward (within 2° of radial) and counter-clockwise triangles seen from outside', () => {
    let worstCos = 1;
    for (let v = 0; v < mesh.vertexCount; v++) {
      const [x, y, z] = mesh.positions.slice(3 * v, 3 * v + 3);
      const [nx, ny, nz] = mesh.normals.slice(3 * v, 3 * v + 3);
      expect(Math.hypot(nx, ny, nz)).toBeCloseTo(1, 6);
      worstCos = Math.min(worstCos, (x * nx + y * ny + z * nz) / Math.hypot(x, y, z));
    }
    expect(worstCos).toBeGreaterThan(Math.cos((2 * Math.PI) / 180));
    expect(triangleNormalsOutward(mesh, [0, 0, 0])).toBe(mesh.triangleCount);
  });

  it('refuses a mesh above the triangle cap, naming the field', () => {
    expect(() => marchingCubes(field, grid, { isovalue: psi1s(R, 0, 0), maxTriangles: 100 })).toThrow(
      /maxTriangles: the surface needs more than 100 triangles/,
    );
  });
});

describe('marching cubes on 2p_z (ψ = ±0.05 bohr^-3/2)', () => {
  const field = sampleField(grid, psi2pz);
  const positive = marchingCubes(field, grid, { isovalue: 0.05 });
  const negative = marchingCubes(field, grid, { isovalue: 0.05, sign: -1 });

  it('gives one closed lobe above the xy nodal plane and its mirror image below', () => {
    for (const [mesh, side] of [[positive, 1], [negative, -1]] as const) {
      expect(componentCount(mesh)).toBe(1);
      expect([...new Set(edgeUse(mesh).values())]).toEqual([2]);
      expect(eulerCharacteristic(mesh)).toBe(2);
      for (let v = 0; v < mesh.vertexCount; v++) expect(side * mesh.positions[3 * v + 2]).toBeGreaterThan(0);
    }
    expect(negative.triangleCount).toBe(positive.triangleCount);
    expect(negative.vertexCount).toBe(positive.vertexCount);
  });

  it('points the negative lobe\'s normals out of the lobe (away from its centre on −z)', () => {
    let centreZ = 0;
    for (let v = 0; v < negative.vertexCount; v++) centreZ += negative.positions[3 * v + 2] / negative.vertexCount;
    expect(triangleNormalsOutward(negative, [0, 0, centreZ])).toBe(negative.triangleCount);
  });

  it('is deterministic: the same input gives the same arrays', () => {
    const again = marchingCubes(field, grid, { isovalue: 0.05 });
    expect(again.triangleCount).toBe(positive.triangleCount);
    expect(again.indices).toEqual(positive.indices);
    expect(again.positions).toEqual(positive.positions);
  });
});

describe('marching cubes of |ψ| with phase (ψ ∝ (x + iy) e^{-r/2}, the 2p m = +1 form)', () => {
  const re = sampleField(grid, (x, y, z) => x * Math.exp(-Math.hypot(x, y, z) / 2));
  const im = sampleField(grid, (x, y, z) => y * Math.exp(-Math.hypot(x, y, z) / 2));
  const magnitude = re.map((a, i) => Math.hypot(a, im[i]));
  const mesh = marchingCubes(magnitude, grid, { isovalue: 0.5, phase: { re, im } });

  it('gives each vertex arg ψ = φ = atan2(y, x) within 0.02 rad', () => {
    expect(mesh.phases).not.toBeNull();
    let worst = 0;
    for (let v = 0; v < mesh.vertexCount; v++) {
      const phi = Math.atan2(mesh.positions[3 * v + 1], mesh.positions[3 * v]);
      const d = Math.abs(Math.atan2(Math.sin(mesh.phases![v] - phi), Math.cos(mesh.phases![v] - phi)));
      worst = Math.max(worst, d);
    }
    expect(worst).toBeLessThan(0.02);
    expect(componentCount(mesh)).toBe(1);
    expect(eulerCharacteristic(mesh)).toBe(0); // a ring around the z axis: a torus
  });
});

describe('marching cubes on a noisy field (many ambiguous faces)', () => {
  it('still closes every surface that stays inside the grid', () => {
    const noisy = { n: 20, half: 1 };
    const field = new Float32Array(20 ** 3);
    let seed = 12345;
    for (let p = 0; p < field.length; p++) {
      seed = (seed * 1103515245 + 12345) % 2 ** 31; // fixed linear congruential sequence: deterministic
      const [i, j, k] = [p % 20, Math.floor(p / 20) % 20, Math.floor(p / 400)];
      const onBoundary = [i, j, k].some((c) => c === 0 || c === 19);
      field[p] = onBoundary ? -1 : seed / 2 ** 30 - 1;
    }
    const mesh = marchingCubes(field, noisy, { isovalue: 0 });
    expect(mesh.triangleCount).toBeGreaterThan(5000);
    expect([...new Set(edgeUse(mesh).values())]).toEqual([2]);
  });
});
