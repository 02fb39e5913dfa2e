/**
 * Contour lines of a slice: lines of constant ψ (signed, real states) or of constant |ψ|²,
 * as polylines in plane coordinates (u, v) in bohr.
 *
 * Method: marching squares with linear interpolation, by d3-contour (Bostock, d3-contour 4,
 * `contours().contour(values, level)`). d3 returns the boundaries of the regions {value ≥ level}
 * as closed rings, closing them along the raster edge where a region runs off it; those closing
 * pieces are not contour lines, so each ring is cut where it touches the raster edge: a ring
 * that never does is a closed line, the rest become open polylines. d3 places sample i at
 * coordinate i + 0.5; ring points on coordinates 0 or W (0 or H) lie outside the samples.
 */
import { contours } from 'd3-contour';
import { OrbitalInputError } from '../physics/orbital-input-error';
import type { Slice } from './slice';

export type ContourKind = 'psi' | 'density';

export interface ContourLine {
  readonly closed: boolean;
  /** [u, v] in bohr; a closed line does not repeat its first point. */
  readonly points: [number, number][];
}

export interface ContourLevel {
  readonly kind: ContourKind;
  /** ψ in bohr^(−3/2) (any sign) or |ψ|² in bohr⁻³. */
  readonly level: number;
  readonly lines: ContourLine[];
}

export function sliceContours(slice: Slice, kind: ContourKind, levels: readonly number[]): ContourLevel[] {
  if (kind !== 'psi' && kind !== 'density') throw new OrbitalInputError('kind', `must be "psi" or "density", got "${String(kind)}"`);
  if (kind === 'psi' && slice.im !== null) {
    throw new OrbitalInputError('kind', 'ψ is complex for this state: contour the density instead');
  }
  levels.forEach((level, i) => {
    if (typeof level !== 'number' || !Number.isFinite(level)) throw new OrbitalInputError(`levels[${i}]`, 'must be a finite number');
    if (kind === 'density' && level <= 0) throw new OrbitalInputError(`levels[${i}]`, 'a density level must be positive');
  });
  const { width, height, re, im } = slice;
  const values = kind === 'psi' ? re : re.map((a, s) => a * a + (im ? im[s] * im[s] : 0));
  const generator = contours().size([width, height]);
  const toU = (x: number): number => -slice.halfWidth + (x - 0.5) * slice.spacing;
  const toV = (y: number): number => -slice.halfHeight + (y - 0.5) * slice.spacing;
  const onRasterEdge = (p: number[]): boolean => p[0] <= 0 || p[0] >= width || p[1] <= 0 || p[1] >= height;

  return levels.map((level) => {
    const lines: ContourLine[] = [];
    for (const polygon of generator.contour(values as unknown as number[], level).coordinates) {
      for (const ring of polygon) {
        const points = ring.slice(0, -1); // d3 repeats the first point at the end
        const start = points.findIndex(onRasterEdge);
        if (start < 0) {
          lines.push({ closed: true, points: points.map((p) => [toU(p[0]), toV(p[1])]) });
          continue;
        }
        let run: [number, number][] = [];
        for (let t = 1; t <= points.length; t++) {
          const p = points[(start + t) % points.length];
          if (onRasterEdge(p)) {
            if (run.length > 1) lines.push({ closed: false, points: run });
            run = [];
          } else {
            run.push([toU(p[0]), toV(p[1])]);
          }
        }
      }
    }
    return { kind, level, lines };
  });
}
