/**
 * Where the print renderer's raster puts the things a vector overlay labels: the nucleus, the
 * positive end of each axis, and the scale bar's ends with its label, in pixels from the top left
 * corner of the PNG.
 */
import { Vector3, type Camera } from 'three';
import type { ScaleBarLayout } from './scale-bar-layout';

export interface PrintProjection {
  readonly widthPx: number;
  readonly heightPx: number;
  /** Pixels per bohr at the nucleus. */
  readonly pixelsPerBohr: number;
  readonly nucleus: readonly [number, number];
  readonly axes: readonly {
    readonly name: 'x' | 'y' | 'z';
    readonly end: readonly [number, number];
  }[];
  readonly scaleBar: ScaleBarLayout | null;
}

export function projectToPixels(
  camera: Camera,
  point: readonly [number, number, number],
  widthPx: number,
  heightPx: number,
): [number, number] {
  const v = new Vector3(point[0], point[1], point[2]).project(camera);
  return [((v.x + 1) / 2) * widthPx, ((1 - v.y) / 2) * heightPx];
}
