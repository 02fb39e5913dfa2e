/**
 * Size limits of grids, meshes and slices (they protect the browser worker and the server), and the
 * choice of the grid for a state: n points per axis and the half-width, given or automatic.
 */
import type { CompiledState } from '../physics/orbital-state';
import { OrbitalInputError } from '../physics/orbital-input-error';
import { suggestedExtent, type GridSpec } from '../physics/sample-state-on-grid';

/** Largest grid: 256³ samples are 64 MB per float32 array (ψ, and Im ψ and |ψ| for complex states). */
export const MAX_GRID_POINTS_PER_AXIS = 256;
/** Smallest grid that still resolves a lobe into more than a few cubes. */
export const MIN_GRID_POINTS_PER_AXIS = 8;
/** Largest slice side in samples (2048² samples, 16 MB for Re ψ). */
export const MAX_SLICE_SIDE = 2048;
/** Largest half-width accepted for a grid, bohr (n = 30 states reach about 3600 bohr for Z = 1). */
export const MAX_EXTENT = 10_000;

export interface GridChoice {
  /** Points per axis. */
  n: number;
  /** Half-width in bohr; omitted: suggestedExtent of the state (≥ 99.9 % of each term inside). */
  extent?: number;
}

export function resolveGrid(c: CompiledState, choice: GridChoice): GridSpec {
  const { n, extent } = choice;
  if (!Number.isInteger(n) || n < MIN_GRID_POINTS_PER_AXIS || n > MAX_GRID_POINTS_PER_AXIS) {
    throw new OrbitalInputError(
      'grid',
      `must be an integer from ${MIN_GRID_POINTS_PER_AXIS} to ${MAX_GRID_POINTS_PER_AXIS} points per axis, got ${String(n)}`,
    );
  }
  if (extent === undefined) return { n, half: suggestedExtent(c) };
  if (typeof extent !== 'number' || !Number.isFinite(extent) || extent <= 0 || extent > MAX_EXTENT) {
    throw new OrbitalInputError('extent', `must be a half-width in bohr above 0 and at most ${MAX_EXTENT}, got ${String(extent)}`);
  }
  return { n, half: extent };
}
