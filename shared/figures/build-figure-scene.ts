/**
 * The 2D figure builders behind one entry point: a resolved spec → its scene, dispatching on the
 * figure kind. 3D kinds (isosurface, cloud, angular surface) are drawn by the 3D renderer; their
 * vector overlay comes from build3dOverlay.
 */
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { buildAngularCurveScene } from './build-angular-curve-scene';
import { buildLevelsScene } from './build-levels-scene';
import { buildPotentialScene } from './build-potential-scene';
import { buildRadialScene } from './build-radial-scene';
import { buildSliceScene } from './build-slice-scene';
import { FigureSpecError } from './figure-error';
import { buildSolvedLevelsScene } from './solved-levels-scene';
import type { FigureDatasets } from './radial-datasets';
import type { FigureScene } from './scene';

/** `datasets`: the uploaded points a radial figure's kind.datasets name, resolved by the caller. */
export function buildFigureScene(spec: ResolvedFigureSpec, datasets?: FigureDatasets): FigureScene {
  switch (spec.kind.type) {
    case 'radial':
      return buildRadialScene(spec, datasets);
    case 'slice':
      return buildSliceScene(spec);
    case 'levels':
      return spec.kind.compare ? buildSolvedLevelsScene(spec) : buildLevelsScene(spec);
    case 'potential':
      return buildPotentialScene(spec);
    case 'angular':
      if (spec.kind.mode === 'curve') return buildAngularCurveScene(spec);
      throw new FigureSpecError(
        'kind.mode',
        'an angular surface is a 3D figure; draw it with the 3D renderer and build3dOverlay',
      );
    default:
      throw new FigureSpecError(
        'kind.type',
        `"${spec.kind.type}" is not a 2D figure; draw it with the 3D renderer and build3dOverlay`,
      );
  }
}
