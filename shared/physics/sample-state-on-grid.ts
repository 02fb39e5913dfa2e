/**
 * Samples ψ of a compiled state on a cubic grid: the hot path behind isosurfaces and slices.
 *
 * Grid (shared with shared/grid): the cube [−half, half]³ in bohr, n points per axis, spacing
 * 2·half/(n − 1), point (i, j, k) at index i + n(j + nk), x fastest (./coordinates gridIndex).
 * Method: per point one square root, one exponential per distinct n, the Laguerre and solid-harmonic
 * recurrences (polynomials in x, y, z, no trigonometry), all in ./orbital-state accumulateTerms so
 * evaluatePsi and the grid give identical numbers. Where the time goes: for a single 4f term on 128³
 * about half in Math.exp and Math.sqrt, the rest in the two short recurrences. No allocation in the
 * loops: scratch objects are hoisted.
 */
import type { Complex } from './complex';
import { OrbitalInputError } from './orbital-input-error';
import { accumulateTerms, fillExponentials, type CompiledState } from './orbital-state';
import { enclosingRadiusValue } from './radius-enclosing-probability';
import { MAX_PRINCIPAL_QUANTUM_NUMBER } from './quantum-numbers';

export interface GridSpec {
  /** Points per axis. */
  n: number;
  /** Half-width of the cube in bohr. */
  half: number;
}

/** Largest grid the sampler accepts per axis (512³ floats is 0.5 GB for re + im). */
export const MAX_GRID_POINTS_PER_AXIS = 512;
/** Probability each term must hold inside the suggested cube. */
export const EXTENT_PROBABILITY = 0.999;

function checkGrid(grid: GridSpec): void {
  if (typeof grid !== 'object' || grid === null)
    throw new OrbitalInputError('grid', 'must be { n, half }');
  if (!Number.isInteger(grid.n) || grid.n < 2 || grid.n > MAX_GRID_POINTS_PER_AXIS) {
    throw new OrbitalInputError(
      'grid.n',
      `must be an integer from 2 to ${MAX_GRID_POINTS_PER_AXIS}, got ${String(grid.n)}`,
    );
  }
  if (typeof grid.half !== 'number' || !Number.isFinite(grid.half) || grid.half <= 0) {
    throw new OrbitalInputError(
      'grid.half',
      `must be a positive number of bohr, got ${String(grid.half)}`,
    );
  }
}

export function sampleStateOnGrid(
  c: CompiledState,
  grid: GridSpec,
  outRe: Float32Array,
  outIm: Float32Array | null,
): void {
  checkGrid(grid);
  const n = grid.n;
  const total = n * n * n;
  if (outRe.length < total)
    throw new OrbitalInputError('outRe', `needs ${total} elements, got ${outRe.length}`);
  if (outIm === null && !c.isReal)
    throw new OrbitalInputError(
      'outIm',
      'the state is complex: an array for the imaginary part is required',
    );
  if (outIm !== null && outIm.length < total)
    throw new OrbitalInputError('outIm', `needs ${total} elements, got ${outIm.length}`);

  const step = (2 * grid.half) / (n - 1);
  const expN = new Float64Array(MAX_PRINCIPAL_QUANTUM_NUMBER + 1);
  const value: Complex = { re: 0, im: 0 };
  let index = 0;
  for (let k = 0; k < n; k++) {
    const z = -grid.half + k * step;
    for (let j = 0; j < n; j++) {
      const y = -grid.half + j * step;
      const yz2 = y * y + z * z;
      for (let i = 0; i < n; i++, index++) {
        const x = -grid.half + i * step;
        const r2 = x * x + yz2;
        const r = Math.sqrt(r2);
        fillExponentials(c, r, expN);
        accumulateTerms(c, x, y, z, r, r2, expN, value);
        outRe[index] = value.re;
        if (outIm !== null) outIm[index] = value.im;
      }
    }
  }
}

/** Rounds up to two significant digits (12.31 → 13, 7.301 → 7.4). */
function roundUpTwoDigits(v: number): number {
  const unit = Math.pow(10, Math.floor(Math.log10(v)) - 1);
  return Math.ceil(v / unit - 1e-9) * unit;
}

/**
 * Half-width (bohr) of a cube holding ≥ 99.9 % of the probability of every term: the sphere of radius
 * r_0.999 of each (n, l) lies inside the cube; the largest radius is rounded up to two digits.
 */
export function suggestedExtent(c: CompiledState): number {
  let largest = 0;
  const done = new Set<string>();
  for (const t of c.realTerms) {
    const key = `${t.n},${t.l}`;
    if (done.has(key)) continue;
    done.add(key);
    largest = Math.max(largest, enclosingRadiusValue(t.n, t.l, EXTENT_PROBABILITY, c.zEff));
  }
  return Number(roundUpTwoDigits(largest).toPrecision(12));
}
