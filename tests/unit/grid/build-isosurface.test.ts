// The whole isosurface pipeline on real states from shared/physics: levels against REFERENCE.md §9
// (1s) and the mpmath fixture (2p_z), surfaces closed and where the exact surface is.
import { describe, expect, it } from 'vitest';
import { compileState } from '../../../shared/physics/orbital-state';
import { buildIsosurface } from '../../../shared/grid/build-isosurface';
import { resolveGrid } from '../../../shared/grid/grid-limits';
import fixture from './fixtures/enclosed-probability-level.json';
import { componentCount, edgeUse, eulerCharacteristic } from './test-fields';

const state = (n: number, l: number, m: number, basis: 'real' | 'complex' = 'real', Z = 1) =>
  compileState({ Z, terms: [{ n, l, m, basis }] });
// Level tolerances: sub-voxel (default) h²/3 (shared/grid/sub-voxel-level.ts); sample count 2σ with
// σ(c)/c ≈ 1.13 h²/r (shared/grid/enclosed-probability-level.ts).
const subVoxelTolerance = (h: number): number => (h * h) / 3;
const countTolerance = (h: number, r: number): number => 2 * 1.13 * (h * h) / r;

describe('buildIsosurface, 1s at 90 % on the automatic grid (n = 96)', () => {
  const result = buildIsosurface(state(1, 0, 0), { enclosed: 0.9, grid: 96 });
  const h = (2 * result.grid.half) / 95;

  it('finds c_0.9 of REFERENCE.md §9 (0.001 553 802 348 981 213 bohr⁻³) within the grid tolerance', () => {
    const c = 0.001553802348981213;
    expect(result.levelMethod).toBe('sub-voxel');
    expect(Math.abs(result.densityLevel - c) / c).toBeLessThan(subVoxelTolerance(h));
    expect(result.psiLevel).toBe(Math.sqrt(result.densityLevel));
    expect(Math.abs(result.enclosed - 0.9)).toBeLessThan(1e-12);
    expect(Math.abs(result.enclosedBySamples - 0.9)).toBeLessThan(0.01);
    expect(result.gridTotal).toBeGreaterThan(0.999);
    expect(result.gridTotal).toBeLessThan(1);
    expect(result.clippedByGrid).toBe(false);
  });

  it('gives one closed sphere of radius r_0.9 = 2.661 bohr (within h/2) and no negative surface', () => {
    const mesh = result.positive!;
    expect(result.negative!.triangleCount).toBe(0);
    expect(result.magnitude).toBeNull();
    expect(result.triangles).toEqual({ positive: mesh.triangleCount, negative: 0, magnitude: 0 });
    expect(eulerCharacteristic(mesh)).toBe(2);
    for (let v = 0; v < mesh.vertexCount; v++) {
      const r = Math.hypot(mesh.positions[3 * v], mesh.positions[3 * v + 1], mesh.positions[3 * v + 2]);
      expect(Math.abs(r - 2.661160168917105)).toBeLessThan(h / 2);
    }
  });

  it('can use the whole-sample count instead, which encloses at least the fraction asked for', () => {
    const counted = buildIsosurface(state(1, 0, 0), { enclosed: 0.9, grid: 96, levelMethod: 'samples' });
    const c = 0.001553802348981213;
    expect(counted.levelMethod).toBe('samples');
    expect(Math.abs(counted.densityLevel - c) / c).toBeLessThan(countTolerance(h, 2.661160168917105));
    expect(counted.enclosed).toBeGreaterThanOrEqual(0.9);
    expect(counted.enclosedBySamples).toBe(counted.enclosed);
  });

  it('is deterministic and reports three timings', () => {
    const again = buildIsosurface(state(1, 0, 0), { enclosed: 0.9, grid: 96 });
    expect(again.triangles).toEqual(result.triangles);
    expect(again.positive!.indices).toEqual(result.positive!.indices);
    for (const ms of Object.values(result.ms)) expect(ms).toBeGreaterThanOrEqual(0);
  });

  it('scales with Z as REFERENCE.md §9 says: c ∝ Z³ on a grid scaled by 1/Z', () => {
    const he = buildIsosurface(state(1, 0, 0, 'real', 2), { enclosed: 0.9, grid: 96, extent: result.grid.half / 2 });
    expect(he.densityLevel / result.densityLevel).toBeCloseTo(8, 4);
  });
});

describe('buildIsosurface, 2p_z at 90 % (n = 128, half-width 12 bohr)', () => {
  const result = buildIsosurface(state(2, 1, 0), { enclosed: 0.9, grid: 128, extent: 12 });
  const exact = fixture['2p_z'].find((x) => x.enclosed === 0.9)!;
  const h = 24 / 127;

  it('matches the mpmath level and gives two closed mirror-image lobes', () => {
    expect(Math.abs(result.densityLevel - exact.densityLevel) / exact.densityLevel).toBeLessThan(subVoxelTolerance(h));
    for (const mesh of [result.positive!, result.negative!]) {
      expect(componentCount(mesh)).toBe(1);
      expect([...new Set(edgeUse(mesh).values())]).toEqual([2]);
    }
    expect(result.triangles.negative).toBe(result.triangles.positive);
  });
});

describe('buildIsosurface, complex 2p (m = +1, complex basis)', () => {
  it('meshes |ψ| = √c once, as a ring (at 50 %, where the hole on the z axis is wider than the grid spacing), with arg ψ = φ + constant', () => {
    const result = buildIsosurface(state(2, 1, 1, 'complex'), { enclosed: 0.5, grid: 64 });
    expect(result.isReal).toBe(false);
    expect(result.positive).toBeNull();
    expect(result.negative).toBeNull();
    const mesh = result.magnitude!;
    expect(eulerCharacteristic(mesh)).toBe(0);
    // Y_1^1 ∝ −sin θ e^{iφ} (Condon–Shortley): arg ψ = φ + π, up to the global phase the state removes.
    const offsets = Array.from({ length: mesh.vertexCount }, (_, v) => {
      const d = mesh.phases![v] - Math.atan2(mesh.positions[3 * v + 1], mesh.positions[3 * v]);
      return Math.atan2(Math.sin(d), Math.cos(d));
    });
    const spread = Math.max(...offsets.map((d) => Math.abs(Math.atan2(Math.sin(d - offsets[0]), Math.cos(d - offsets[0])))));
    expect(spread).toBeLessThan(0.05);
  });
});

describe('limits and bad input', () => {
  const s1 = state(1, 0, 0);
  it('refuses grids above 256 or below 8 points per axis, naming "grid"', () => {
    expect(() => buildIsosurface(s1, { enclosed: 0.9, grid: 257 })).toThrow(/^grid: must be an integer from 8 to 256 points per axis, got 257/);
    expect(() => resolveGrid(s1, { n: 4 })).toThrow(/^grid:/);
    expect(() => resolveGrid(s1, { n: 64.5 })).toThrow(/^grid:/);
  });
  it('takes a given extent or the suggested one, and refuses bad extents naming "extent"', () => {
    expect(resolveGrid(s1, { n: 64, extent: 9 })).toEqual({ n: 64, half: 9 });
    expect(resolveGrid(s1, { n: 64 }).half).toBeGreaterThan(5.6); // r_0.999 of 1s is 5.6 bohr (P(3, 2r) = 0.999)
    expect(() => resolveGrid(s1, { n: 64, extent: 0 })).toThrow(/^extent:/);
    expect(() => resolveGrid(s1, { n: 64, extent: Number.POSITIVE_INFINITY })).toThrow(/^extent:/);
  });
  it('refuses enclosed fractions outside (0, 1) and unknown level methods, naming the field', () => {
    expect(() => buildIsosurface(s1, { enclosed: 1, grid: 32 })).toThrow(/^enclosed: must be a fraction strictly between 0 and 1/);
    expect(() => buildIsosurface(s1, { enclosed: 0.5, grid: 32, levelMethod: 'exact' as 'samples' })).toThrow(/^levelMethod:/);
  });
  it('refuses meshes above the triangle cap, naming "maxTriangles"', () => {
    expect(() => buildIsosurface(s1, { enclosed: 0.9, grid: 64, maxTriangles: 1000 })).toThrow(/^maxTriangles:/);
  });
  it('says when the surface is cut open by a small extent', () => {
    const cut = buildIsosurface(s1, { enclosed: 0.5, grid: 32, extent: 1.2 });
    expect(cut.clippedByGrid).toBe(true);
    expect(cut.gridTotal).toBeLessThan(0.9);
  });
});
