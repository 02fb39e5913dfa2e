// Which kinds are drawn in 3D (isosurface, cloud, angular surface) and which as flat 2D figures.
import type { FigureKind } from '../../../../shared/spec/figure-spec';

export function isThreeDimensional(kind: FigureKind): boolean {
  return (
    kind.type === 'isosurface' ||
    kind.type === 'cloud' ||
    (kind.type === 'angular' && kind.mode === 'surface')
  );
}
