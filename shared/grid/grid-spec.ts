/**
 * The sampling grid, as shared/physics defines it (sampleStateOnGrid): the cube [−half, half]³ bohr
 * with n points per axis, spacing h = 2·half/(n − 1), sample (i, j, k) at index i + n·(j + n·k)
 * (x fastest) and position (−half + i·h, −half + j·h, −half + k·h).
 */
import type { GridSpec } from '../physics/sample-state-on-grid';

export type { GridSpec };

/** Distance between neighbouring samples along an axis, bohr. */
export function gridSpacing(grid: GridSpec): number {
  return (2 * grid.half) / (grid.n - 1);
}
