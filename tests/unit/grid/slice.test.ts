// Slices and their contour lines against closed forms: ψ_2p_z and ψ_1s (Griffiths, Introduction to
// Quantum Mechanics, 2nd ed., §4.2, equation numbers from memory; values agree with REFERENCE.md §6),
// and the 1s radius enclosing 90 % from REFERENCE.md §9.
import { describe, expect, it } from 'vitest';
import { compileState } from '../../../shared/physics/orbital-state';
import { sampleSlice, type Slice } from '../../../shared/grid/slice';
import { sliceContours } from '../../../shared/grid/slice-contours';
import { sliceContoursEnclosing } from '../../../shared/grid/slice-contours-enclosing';
import { slicePlaneAxes, type Vector3 } from '../../../shared/grid/slice-plane';
import { psi1s, psi2pz } from './test-fields';

const state2pz = compileState({ Z: 1, terms: [{ n: 2, l: 1, m: 0, basis: 'real' }] });
const state1s = compileState({ Z: 1, terms: [{ n: 1, l: 0, m: 0, basis: 'real' }] });

describe('slice planes', () => {
  it('give the named planes their textbook axes', () => {
    expect(slicePlaneAxes('xy')).toEqual({ u: [1, 0, 0], v: [0, 1, 0], normal: [0, 0, 1] });
    const xz = slicePlaneAxes('xz');
    expect([...xz.u].map((c) => c + 0)).toEqual([1, 0, 0]);
    expect([...xz.v].map((c) => c + 0)).toEqual([0, 0, 1]);
    const yz = slicePlaneAxes('yz');
    expect([...yz.u].map((c) => c + 0)).toEqual([0, 1, 0]);
    expect([...yz.v].map((c) => c + 0)).toEqual([0, 0, 1]);
  });

  it('make any normal a right-handed frame with u × v = N and v leaning toward +z', () => {
    for (const normal of [[1, 2, 3], [-0.3, 0.1, 0], [0, 0, -2], [5, -1, -4]] as Vector3[]) {
      const { u, v, normal: nn } = slicePlaneAxes({ normal });
      const dot = (a: Vector3, b: Vector3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
      const length = Math.hypot(...normal);
      expect(dot(u, u)).toBeCloseTo(1, 14);
      expect(dot(v, v)).toBeCloseTo(1, 14);
      expect(dot(u, v)).toBeCloseTo(0, 14);
      nn.forEach((c, i) => expect(c).toBeCloseTo(normal[i] / length, 14));
      const uxv = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
      uxv.forEach((c, i) => expect(c).toBeCloseTo(nn[i], 14));
      expect(v[2]).toBeGreaterThanOrEqual(0);
    }
    expect(slicePlaneAxes({ normal: [0, 0, -2] }).u).toEqual([-1, 0, 0]);
  });

  it('refuse bad planes, naming the field', () => {
    expect(() => slicePlaneAxes('xw' as 'xy')).toThrow(/^plane: must be "xy", "xz", "yz"/);
    expect(() => slicePlaneAxes({ normal: [0, 0, 0] })).toThrow(/^plane.normal: must not be the zero vector/);
    expect(() => slicePlaneAxes({ normal: [1, Number.NaN, 0] })).toThrow(/^plane.normal/);
  });
});

describe('sampleSlice', () => {
  const slice = sampleSlice(state2pz, { plane: 'xz', width: 41, height: 31, halfWidth: 10 });

  it('lays the raster out as documented and takes ψ from the state (2p_z in the xz plane)', () => {
    expect(slice.spacing).toBe(0.5);
    expect(slice.halfHeight).toBe(7.5);
    expect(slice.im).toBeNull();
    for (const [i, j] of [[0, 0], [20, 15], [25, 29], [40, 30], [3, 22]]) {
      const u = -10 + 0.5 * i;
      const v = -7.5 + 0.5 * j;
      const expected = psi2pz(u, 0, v);
      expect(Math.abs(slice.re[i + 41 * j] - expected)).toBeLessThanOrEqual(Math.abs(expected) * 1e-7 + 1e-30);
    }
  });

  it('keeps Im ψ for complex states (2p, m = +1, complex basis)', () => {
    const complex = compileState({ Z: 1, terms: [{ n: 2, l: 1, m: 1, basis: 'complex' }] });
    expect(sampleSlice(complex, { plane: 'xy', width: 8, height: 8, halfWidth: 5 }).im).toBeInstanceOf(Float32Array);
  });

  it('refuses bad rasters, naming the field', () => {
    expect(() => sampleSlice(state1s, { plane: 'xy', width: 1, height: 10, halfWidth: 5 })).toThrow(/^width: must be an integer from 2 to 2048/);
    expect(() => sampleSlice(state1s, { plane: 'xy', width: 10, height: 4096, halfWidth: 5 })).toThrow(/^height/);
    expect(() => sampleSlice(state1s, { plane: 'xy', width: 10, height: 10, halfWidth: -1 })).toThrow(/^halfWidth/);
  });
});

function handMadeSlice(f: (u: number, v: number) => number, width: number, height: number, halfWidth: number): Slice {
  const spacing = (2 * halfWidth) / (width - 1);
  const halfHeight = (spacing * (height - 1)) / 2;
  const re = new Float32Array(width * height);
  for (let j = 0; j < height; j++) for (let i = 0; i < width; i++) re[i + width * j] = f(-halfWidth + i * spacing, -halfHeight + j * spacing);
  return { axes: slicePlaneAxes('xy'), width, height, halfWidth, halfHeight, spacing, re, im: null };
}

describe('sliceContours', () => {
  it('traces the circle |ψ_1s|² = |ψ_1s(2 bohr)|² as one closed line of radius 2', () => {
    const slice = handMadeSlice((u, v) => psi1s(u, v, 0), 121, 101, 6);
    const [contour] = sliceContours(slice, 'density', [psi1s(2, 0, 0) ** 2]);
    expect(contour.lines).toHaveLength(1);
    expect(contour.lines[0].closed).toBe(true);
    const radii = contour.lines[0].points.map(([u, v]) => Math.hypot(u, v));
    // Linear interpolation of e^{-2r} between samples s apart errs by at most s²/4 in radius.
    for (const r of radii) expect(Math.abs(r - 2)).toBeLessThan(slice.spacing ** 2 / 4);
    expect(radii.length).toBeGreaterThan((2 * Math.PI * 2) / slice.spacing);
  });

  it('gives 2p_z signed lines: a positive lobe above, a negative one below, an open nodal line on v = 0', () => {
    const slice = handMadeSlice((u, v) => psi2pz(u, 0, v), 80, 60, 10);
    const [positive, negative, nodal] = sliceContours(slice, 'psi', [0.05, -0.05, 0]);
    expect(positive.lines).toHaveLength(1);
    expect(negative.lines).toHaveLength(1);
    expect(positive.lines[0].points.every(([, v]) => v > 0)).toBe(true);
    expect(negative.lines[0].points.every(([, v]) => v < 0)).toBe(true);
    expect(nodal.lines).toHaveLength(1);
    expect(nodal.lines[0].closed).toBe(false);
    for (const [, v] of nodal.lines[0].points) expect(Math.abs(v)).toBeLessThan(1e-9);
    const us = nodal.lines[0].points.map(([u]) => u);
    expect(Math.min(...us)).toBeCloseTo(-10, 9);
    expect(Math.max(...us)).toBeCloseTo(10, 9);
  });

  it('refuses signed contours of a complex ψ and bad levels, naming the field', () => {
    const slice = { ...handMadeSlice(() => 1, 4, 4, 1), im: new Float32Array(16) };
    expect(() => sliceContours(slice, 'psi', [0.1])).toThrow(/^kind: ψ is complex/);
    expect(() => sliceContours(slice, 'density', [0])).toThrow(/^levels\[0\]: a density level must be positive/);
    expect(() => sliceContours(slice, 'density', [1, Number.NaN])).toThrow(/^levels\[1\]/);
  });
});

describe('contours at an enclosed fraction', () => {
  it('draw the 1s 90 % line at r_0.9 = 2.661 160 bohr (REFERENCE.md §9) within 0.02 bohr', () => {
    const slice = sampleSlice(state1s, { plane: 'xz', width: 161, height: 161, halfWidth: 4 });
    const { levels, contours } = sliceContoursEnclosing(state1s, slice, 'density', [0.9], { n: 96 });
    expect(levels[0].enclosed).toBeGreaterThanOrEqual(0.9);
    expect(contours[0].lines).toHaveLength(1);
    // 2σ level error at n = 96 (enclosed-probability-level.ts) moves the radius by ≈ 0.006 bohr.
    for (const [u, v] of contours[0].lines[0].points) expect(Math.abs(Math.hypot(u, v) - 2.661160168917105)).toBeLessThan(0.02);
  });

  it('draw signed 2p_z lines ψ = ±√c at the 3D 90 % level: one per lobe, meeting the z axis at the exact lobe length (mpmath, within 0.05 bohr)', () => {
    const slice = sampleSlice(state2pz, { plane: 'xz', width: 201, height: 201, halfWidth: 12 });
    const { levels, contours } = sliceContoursEnclosing(state2pz, slice, 'psi', [0.9], { n: 96, extent: 12 });
    const [positive, negative] = contours;
    expect(positive.level).toBe(levels[0].psiLevel);
    expect(negative.level).toBe(-levels[0].psiLevel);
    expect(positive.lines).toHaveLength(1);
    expect(negative.lines).toHaveLength(1);
    const top = Math.max(...positive.lines[0].points.map(([, v]) => v));
    const bottom = Math.min(...negative.lines[0].points.map(([, v]) => v));
    // zOuter = 9.1279 bohr (tests/unit/grid/fixtures/enclosed-probability-level.json, mpmath). Allowance:
    // level error ≤ h²/3 = 2.1 % at h = 0.253 moves ψ by 1.1 %, the lobe tip by 1.1 %/|d ln ψ/dz| = 0.027 bohr.
    expect(Math.abs(top - 9.127878299163143)).toBeLessThan(0.05);
    expect(Math.abs(-bottom - 9.127878299163143)).toBeLessThan(0.05);
  });
});
