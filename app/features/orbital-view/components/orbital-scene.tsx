// The 3D figure's scene, shared by the interactive viewport and the print page: camera, lights,
// surfaces (both phases, optional outer surface), cloud, nodal sheets, axes and scale bar.
import { useMemo } from 'react';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import type { OrbitalGeometry } from '../utils/orbital-geometry';
import type { ScaleBarLayout } from '../utils/scale-bar-layout';
import { Axes } from './axes';
import { CloudPoints } from './cloud-points';
import { NodalSheets } from './nodal-sheets';
import { ScaleBar } from './scale-bar';
import { SceneCamera } from './scene-camera';
import { SceneLighting } from './scene-lighting';
import { SurfaceMesh } from './surface-mesh';

/** Colour of axes and scale bar. */
export const GUIDE_COLOUR = '#334155';

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
        <>
          <SurfaceMesh
            mesh={surfaces.positive}
            colour={colours.positive}
            opacity={look.opacity}
            lighting={lighting}
          />
          <SurfaceMesh
            mesh={surfaces.negative}
            colour={colours.negative}
            opacity={look.opacity}
            lighting={lighting}
          />
          <SurfaceMesh
            mesh={surfaces.phase}
            colour={colours.positive}
            phaseColour={colours}
            opacity={look.opacity}
            lighting={lighting}
          />
        </>
      ) : null}
      {outer ? (
        <>
          <SurfaceMesh
            mesh={outer.positive}
            colour={colours.positive}
            opacity={outerOpacity}
            lighting={lighting}
            translucentLayer
          />
          <SurfaceMesh
            mesh={outer.negative}
            colour={colours.negative}
            opacity={outerOpacity}
            lighting={lighting}
            translucentLayer
          />
          <SurfaceMesh
            mesh={outer.phase}
            colour={colours.positive}
            phaseColour={colours}
            opacity={outerOpacity}
            lighting={lighting}
            translucentLayer
          />
        </>
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
