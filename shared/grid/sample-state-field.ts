/**
 * ψ of a state on the grid chosen for it (grid-limits.ts): the first step of isosurfaces and of
 * contour levels by enclosed probability.
 */
import type { CompiledState } from '../physics/orbital-state';
import { sampleStateOnGrid, type GridSpec } from '../physics/sample-state-on-grid';
import { resolveGrid, type GridChoice } from './grid-limits';

export interface StateField {
  readonly grid: GridSpec;
  /** Re ψ, bohr^(−3/2), index i + n·(j + n·k). */
  readonly re: Float32Array;
  /** Im ψ, or null for a real state. */
  readonly im: Float32Array | null;
}

export function sampleStateField(c: CompiledState, choice: GridChoice): StateField {
  const grid = resolveGrid(c, choice);
  const count = grid.n ** 3;
  const re = new Float32Array(count);
  const im = c.isReal ? null : new Float32Array(count);
  sampleStateOnGrid(c, grid, re, im);
  return { grid, re, im };
}
