// The 3D figure's scene, shared by the interactive viewport and the print page: camera, lights,
// surfaces (both phases, optional outer surface), cloud, nodal sheets, axes and scale bar.
import { useMemo } from 'react';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import type { OrbitalGeometry, SurfaceSet } from '../utils/orbital-geometry';
import type { ScaleBarLayout } from '../utils/scale-bar-layout';
import { Axes } from './axes';
import { CloudPoints } from './cloud-points';
import { NodalSheets } from './nodal-sheets';
import { ScaleBar } from './scale-bar';
import { SceneCamera } from './scene-camera';
import { SceneLighting, type LightingPreset } from './scene-lighting';
import { SurfaceMesh } from './surface-mesh';

/** Colour of axes and scale bar. */
export const GUIDE_COLOUR = '#334155';

interface SurfaceSetMeshesProps {
  set: SurfaceSet;
  colours: { positive: string; negative: string };
  opacity: number;
  lighting: LightingPreset;
  translucentLayer?: boolean;
}

/** The two phases of a real state, or the phase-coloured surface of a complex one. */
function SurfaceSetMeshes({
  set,
  colours,
  opacity,
  lighting,
  translucentLayer,
}: SurfaceSetMeshesProps) {
  const common = { opacity, lighting, translucentLayer };
  return (
    <>
      <SurfaceMesh mesh={set.positive} colour={colours.positive} {...common} />
      <SurfaceMesh mesh={set.negative} colour={colours.negative} {...common} />
      <SurfaceMesh mesh={set.phase} colour={colours.positive} phaseColour={colours} {...common} />
    </>
  );
}

export interface OrbitalSceneProps {
  geometry: OrbitalGeometry;
  spec: Pick<ResolvedFigureSpec, 'look' | 'view' | 'system' | 'kind'>;
  /** Interactive views label axes and scale bar with DOM text; print leaves labels to the vector overlay. */
  domLabels: boolean;
  lineWidthPx: number;
  pointSizePx: number;
  onScaleBar?: (layout: ScaleBarLayout) => void;
}

export function OrbitalScene({
  geometry,
  spec,
  domLabels,
  lineWidthPx,
  pointSizePx,
  onScaleBar,
}: OrbitalSceneProps) {
  const { look, view } = spec;
  // One object per colour pair: the phase-coloured meshes rebuild their vertex colours when it changes.
  const colours = useMemo(
    () => ({ positive: look.positiveColour, negative: look.negativeColour }),
    [look.positiveColour, look.negativeColour],
  );
  const lighting = view.lighting;
  const outerOpacity =
    spec.kind.type === 'isosurface' && spec.kind.outerSurface
      ? spec.kind.outerSurface.opacity
      : 0.3;
  const surfaces = geometry.surfaces;
  const outer = geometry.outer;
  return (
    <>
      <SceneCamera view={view} radius={geometry.radius}>
        <SceneLighting preset={lighting} />
        {look.showScaleBar && geometry.hasLength ? (
          <ScaleBar
            unit={spec.system.lengthUnit}
            colour={GUIDE_COLOUR}
            lineWidthPx={lineWidthPx}
            domLabel={domLabels}
            onLayout={onScaleBar}
          />
        ) : null}
      </SceneCamera>
      {surfaces ? (
        <SurfaceSetMeshes
          set={surfaces}
          colours={colours}
          opacity={look.opacity}
          lighting={lighting}
        />
      ) : null}
      {outer ? (
        <SurfaceSetMeshes
          set={outer}
          colours={colours}
          opacity={outerOpacity}
          lighting={lighting}
          translucentLayer
        />
      ) : null}
      {geometry.cloud ? (
        <CloudPoints
          cloud={geometry.cloud}
          isReal={geometry.facts.isReal}
          positive={colours.positive}
          negative={colours.negative}
          opacity={look.opacity}
          sizePx={pointSizePx}
        />
      ) : null}
      {look.showNodalSurfaces ? <NodalSheets mesh={geometry.nodalSheets} /> : null}
      {look.showAxes ? (
        <Axes
          radius={geometry.radius}
          colour={GUIDE_COLOUR}
          lineWidthPx={lineWidthPx}
          labels={domLabels}
        />
      ) : null}
    </>
  );
}
