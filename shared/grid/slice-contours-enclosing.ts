/**
 * Contour lines of a slice at the levels whose 3D isosurfaces enclose given fractions of the
 * probability, so a slice and an isosurface figure of the same state and fraction agree: the
 * levels come from the 3D grid (find-isosurface-levels.ts), not from the plane.
 * For kind "psi" each fraction gives two lines, ψ = +√c and ψ = −√c (real states only).
 */
import type { CompiledState } from '../physics/orbital-state';
import { findIsosurfaceLevels, type IsosurfaceLevel, type LevelMethod } from './find-isosurface-levels';
import type { GridChoice } from './grid-limits';
import { sampleStateField } from './sample-state-field';
import type { Slice } from './slice';
import { sliceContours, type ContourKind, type ContourLevel } from './slice-contours';

export interface EnclosingContours {
  /** One entry per fraction, as findIsosurfaceLevels reports it. */
  readonly levels: IsosurfaceLevel[];
  /** density: one contour per fraction; psi: +√c then −√c per fraction. */
  readonly contours: ContourLevel[];
}

export function sliceContoursEnclosing(
  c: CompiledState,
  slice: Slice,
  kind: ContourKind,
  fractions: readonly number[],
  grid: GridChoice,
  method: LevelMethod = 'sub-voxel',
): EnclosingContours {
  const { grid: spec, re, im } = sampleStateField(c, grid);
  const levels = findIsosurfaceLevels(re, im, spec, fractions, method);
  const values = kind === 'density' ? levels.map((l) => l.densityLevel) : levels.flatMap((l) => [l.psiLevel, -l.psiLevel]);
  return { levels, contours: sliceContours(slice, kind, values) };
}
