/**
 * A slice: ψ of a state sampled on a W × H raster in a plane through the nucleus, for 2D figures
 * of the wavefunction or the density and for their contour lines (slice-contours.ts).
 *
 * Raster: sample (i, j) at index i + W·j sits at u = −halfWidth + i·s, v = −halfHeight + j·s
 * (bohr, axes from slice-plane.ts), with square pixels: s = 2·halfWidth/(W − 1) and
 * halfHeight = s·(H − 1)/2. Row j = 0 is the bottom (most negative v). Values come from
 * evaluatePsi, so they agree exactly with the 3D grid and the point evaluation.
 */
import type { CompiledState, Complex } from '../physics/orbital-state';
import { evaluatePsi } from '../physics/orbital-state';
import { OrbitalInputError } from '../physics/orbital-input-error';
import { MAX_SLICE_SIDE } from './grid-limits';
import { slicePlaneAxes, type SliceAxes, type SlicePlane } from './slice-plane';

export interface SliceSpec {
  plane: SlicePlane;
  /** Samples along u. */
  width: number;
  /** Samples along v. */
  height: number;
  /** Half the extent along u, bohr. */
  halfWidth: number;
}

export interface Slice {
  readonly axes: SliceAxes;
  readonly width: number;
  readonly height: number;
  readonly halfWidth: number;
  readonly halfHeight: number;
  /** Sample spacing along u and v, bohr. */
  readonly spacing: number;
  /** Re ψ (bohr^(−3/2)), index i + width·j. */
  readonly re: Float32Array;
  /** Im ψ, or null for a real state. */
  readonly im: Float32Array | null;
}

function checkSide(value: number, field: string): void {
  if (!Number.isInteger(value) || value < 2 || value > MAX_SLICE_SIDE) {
    throw new OrbitalInputError(field, `must be an integer from 2 to ${MAX_SLICE_SIDE}, got ${String(value)}`);
  }
}

export function sampleSlice(c: CompiledState, spec: SliceSpec): Slice {
  checkSide(spec.width, 'width');
  checkSide(spec.height, 'height');
  if (typeof spec.halfWidth !== 'number' || !Number.isFinite(spec.halfWidth) || spec.halfWidth <= 0) {
    throw new OrbitalInputError('halfWidth', `must be a positive number of bohr, got ${String(spec.halfWidth)}`);
  }
  const axes = slicePlaneAxes(spec.plane);
  const { width, height, halfWidth } = spec;
  const spacing = (2 * halfWidth) / (width - 1);
  const halfHeight = (spacing * (height - 1)) / 2;
  const re = new Float32Array(width * height);
  const im = c.isReal ? null : new Float32Array(width * height);
  const { u, v } = axes;
  const value: Complex = { re: 0, im: 0 };
  for (let j = 0; j < height; j++) {
    const b = -halfHeight + j * spacing;
    for (let i = 0; i < width; i++) {
      const a = -halfWidth + i * spacing;
      evaluatePsi(c, a * u[0] + b * v[0], a * u[1] + b * v[1], a * u[2] + b * v[2], value);
      re[i + width * j] = value.re;
      if (im) im[i + width * j] = value.im;
    }
  }
  return { axes, width, height, halfWidth, halfHeight, spacing, re, im };
}
