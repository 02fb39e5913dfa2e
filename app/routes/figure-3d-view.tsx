// The composer's 3D preview for isosurface, cloud and angular-surface figures: the orbital view
// (three.js, loaded only when such a figure is shown) with a ready signal, and, when the only
// unsaved change is a turned view, the bar that keeps that view as a new revision.
import { lazy, Suspense } from 'react';
import type { Figure } from '../../shared/api/schemas';
import type { FigureSpec } from '../../shared/spec/figure-spec';
import type { ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import { canonicalJson } from '../../shared/spec/canonical-json';
import { Loading } from '../components/ui/status';
import { SaveViewBar } from '../features/figures/components/save-view-bar';
import { useOrbitalGeometry } from '../features/orbital-view/hooks/use-orbital-geometry';

const OrbitalViewport = lazy(() =>
  import('../features/orbital-view/components/orbital-viewport').then((m) => ({
    default: m.OrbitalViewport,
  })),
);

type View = FigureSpec['view'];

interface Figure3dPreviewProps {
  spec: ResolvedFigureSpec;
  figure: Figure;
  canEdit: boolean;
  /** The spec being edited differs from the saved one in its view alone. */
  viewOnlyChange: boolean;
  onViewChange?: (view: View) => void;
}

export function Figure3dPreview({
  spec,
  figure,
  canEdit,
  viewOnlyChange,
  onViewChange,
}: Figure3dPreviewProps) {
  // Joins the viewport's request (same cache key), to say when the figure on screen is the one asked for.
  const geometry = useOrbitalGeometry(spec);
  const turned = canonicalJson(spec.view) !== canonicalJson(figure.spec.view);
  return (
    <div className="space-y-3">
      <p role="status" data-figure-ready={geometry.status === 'ready'} className="sr-only">
        {geometry.status === 'ready'
          ? `3D figure ready: ${geometry.facts?.label ?? ''}`
          : geometry.status === 'error'
            ? `3D figure failed: ${geometry.error ?? ''}`
            : `Computing the 3D figure: ${Math.round(100 * geometry.progress)} %`}
      </p>
      {/* Its own stacking layer: the figure's axis labels stay under menus that open over it. */}
      <div className="isolate">
        <Suspense fallback={<Loading label="Loading the 3D view…" />}>
          <OrbitalViewport spec={spec} onViewChange={onViewChange} />
        </Suspense>
      </div>
      {canEdit && viewOnlyChange && turned && onViewChange ? (
        <SaveViewBar
          figure={figure}
          view={spec.view}
          canEdit={canEdit}
          onSaved={() => undefined}
          onReset={() => onViewChange(figure.spec.view)}
        />
      ) : null}
    </div>
  );
}
