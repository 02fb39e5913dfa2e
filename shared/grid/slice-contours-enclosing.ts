/**
 * Contour lines of a slice at the levels whose 3D isosurfaces enclose given fractions of the
 * probability, so a slice and an isosurface figure of the same state and fraction agree: the
 * levels come from the 3D grid (enclosed-probability-level.ts), not from the plane.
 * For kind "psi" each fraction gives two lines, ψ = +√c and ψ = −√c (real states only).
 */
import type { CompiledState } from '../physics/orbital-state';
import { enclosedProbabilityLevels, type EnclosedProbabilityLevel } from './enclosed-probability-level';
import type { GridChoice } from './grid-limits';
import { gridSpacing } from './grid-spec';
import { sampleStateField } from './sample-state-field';
import type { Slice } from './slice';
import { sliceContours, type ContourKind, type ContourLevel } from './slice-contours';

export interface EnclosingContours {
  /** One entry per fraction, as enclosedProbabilityLevels reports it. */
  readonly levels: EnclosedProbabilityLevel[];
  /** density: one contour per fraction; psi: +√c then −√c per fraction. */
  readonly contours: ContourLevel[];
}

export function sliceContoursEnclosing(
  c: CompiledState,
  slice: Slice,
  kind: ContourKind,
  fractions: readonly number[],
  grid: GridChoice,
): EnclosingContours {
  const { grid: spec, re, im } = sampleStateField(c, grid);
  const levels = enclosedProbabilityLevels(re, im, gridSpacing(spec) ** 3, fractions);
  const values = kind === 'density' ? levels.map((l) => l.densityLevel) : levels.flatMap((l) => [l.psiLevel, -l.psiLevel]);
  return { levels, contours: sliceContours(slice, kind, values) };
}
