// The figure page's 3D view for isosurface, cloud and angular-surface figures: the spec drawn with
// the project's house style, turned freely; editors can keep a new view as a revision. three.js
// loads only when such a figure is opened.
import { lazy, Suspense, useState } from 'react';
import type { Figure } from '../../shared/api/schemas';
import { canonicalJson } from '../../shared/spec/canonical-json';
import type { FigureSpec } from '../../shared/spec/figure-spec';
import type { HouseStyle } from '../../shared/spec/house-style';
import { resolveFigureSpec } from '../../shared/spec/resolve-figure-spec';
import { Loading } from '../components/ui/status';
import { SaveViewBar } from '../features/figures/components/save-view-bar';

const OrbitalViewport = lazy(() =>
  import('../features/orbital-view/components/orbital-viewport').then((m) => ({
    default: m.OrbitalViewport,
  })),
);

type View = FigureSpec['view'];

/** Kinds the 3D view draws; slices, radial plots and level diagrams are 2D figures. */
export function hasThreeDimensionalView(spec: FigureSpec): boolean {
  const { kind } = spec;
  return (
    kind.type === 'isosurface' ||
    kind.type === 'cloud' ||
    (kind.type === 'angular' && kind.mode === 'surface')
  );
}

interface Figure3dViewProps {
  figure: Figure;
  houseStyle: HouseStyle;
  canEdit: boolean;
}

export function Figure3dView({ figure, houseStyle, canEdit }: Figure3dViewProps) {
  // The view the reader turned to, tied to the revision it was turned from.
  const [turned, setTurned] = useState<{ revision: number; view: View } | null>(null);
  const view = turned && turned.revision === figure.revision ? turned.view : figure.spec.view;
  const changed = canonicalJson(view) !== canonicalJson(figure.spec.view);
  const resolved = resolveFigureSpec({ ...figure.spec, view }, houseStyle);

  return (
    <div className="space-y-3">
      <Suspense fallback={<Loading label="Loading the 3D view…" />}>
        <OrbitalViewport
          spec={resolved}
          onViewChange={(next) => setTurned({ revision: figure.revision, view: next })}
        />
      </Suspense>
      {changed && (
        <SaveViewBar
          figure={figure}
          view={view}
          canEdit={canEdit}
          onSaved={() => setTurned(null)}
          onReset={() => setTurned(null)}
        />
      )}
    </div>
  );
}
