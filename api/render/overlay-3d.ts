// The vector overlay of a 3D figure (orbital label, axis names, scale-bar label), placed with the
// projection the 3D renderer reports (pixels of the raster), so labels land where the raster draws
// the axes and the bar. The overlay itself comes from shared/figures/build-3d-overlay.
import { build3dOverlay, linearProjection, type OverlayProjection } from '../../shared/figures/build-3d-overlay';
import type { SceneFact, SceneNode } from '../../shared/figures/scene';
import type { ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import type { PrintProjection } from '../../app/features/orbital-view/utils/print-projection';

/** The overlay only needs the axes' directions on the page: a unit length in bohr will do. */
const UNIT_AXIS_BOHR = 1;

export function overlayProjection(spec: ResolvedFigureSpec, p: PrintProjection): OverlayProjection {
  const mmPerPx = spec.print.widthMm / p.widthPx;
  const mm = (pt: readonly [number, number]): [number, number] => [pt[0] * mmPerPx, pt[1] * mmPerPx];
  const nucleus = mm(p.nucleus);
  const end = (name: 'x' | 'y' | 'z') => {
    const axis = p.axes.find((a) => a.name === name);
    return axis ? mm(axis.end) : nucleus;
  };
  return {
    project: linearProjection(nucleus, { x: end('x'), y: end('y'), z: end('z') }, UNIT_AXIS_BOHR),
    mmPerBohr: p.pixelsPerBohr * mmPerPx,
    axisLengthBohr: UNIT_AXIS_BOHR,
    scaleBar: p.scaleBar ? { from: mm(p.scaleBar.from), to: mm(p.scaleBar.to), lengthBohr: p.scaleBar.lengthBohr } : null,
  };
}

export function build3dOverlayNodes(
  spec: ResolvedFigureSpec,
  projection: PrintProjection,
): { nodes: SceneNode[]; facts: SceneFact[] } {
  return build3dOverlay(spec, overlayProjection(spec, projection));
}
