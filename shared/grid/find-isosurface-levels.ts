/**
 * The levels enclosing given fractions of the probability, as isosurfaces and slice contours use
 * them: the sample count (enclosed-probability-level.ts) sharpened by the voxel model
 * (sub-voxel-level.ts) unless asked otherwise. One place, so a 3D figure and a slice of the same
 * state and fraction get the same level.
 */
import { enclosedProbabilityLevels } from './enclosed-probability-level';
import { gridSpacing, type GridSpec } from './grid-spec';
import { subVoxelLevel } from './sub-voxel-level';

/** "sub-voxel": voxels cut by the surface count in part (default); "samples": whole samples only. */
export type LevelMethod = 'sub-voxel' | 'samples';

export interface IsosurfaceLevel {
  readonly fraction: number;
  /** c in bohr⁻³. */
  readonly densityLevel: number;
  /** √c in bohr^(−3/2). */
  readonly psiLevel: number;
  /** Probability inside the surface by the method used, over the exact total (1). */
  readonly enclosed: number;
  /** Probability of the samples with |ψ|² ≥ c, over the exact total. */
  readonly enclosedBySamples: number;
  /** Probability the whole grid holds, over the exact total. */
  readonly gridTotal: number;
  /** The method that produced the level ("samples" also when the voxel model found no bracket). */
  readonly method: LevelMethod;
}

export function findIsosurfaceLevels(
  re: Float32Array,
  im: Float32Array | null,
  grid: GridSpec,
  fractions: readonly number[],
  method: LevelMethod = 'sub-voxel',
): IsosurfaceLevel[] {
  return enclosedProbabilityLevels(re, im, gridSpacing(grid) ** 3, fractions).map((count) => {
    const sharp = method === 'sub-voxel' ? subVoxelLevel(re, im, grid, count) : null;
    if (sharp === null) {
      const { fraction, densityLevel, psiLevel, enclosed, gridTotal } = count;
      return { fraction, densityLevel, psiLevel, enclosed, enclosedBySamples: enclosed, gridTotal, method: 'samples' as const };
    }
    return {
      fraction: count.fraction,
      densityLevel: sharp.densityLevel,
      psiLevel: sharp.psiLevel,
      enclosed: sharp.enclosed,
      enclosedBySamples: sharp.enclosedBySamples,
      gridTotal: count.gridTotal,
      method: 'sub-voxel' as const,
    };
  });
}
