// The interactive 3D figure: geometry from the worker, the shared scene, orbit and zoom with the
// mouse, keyboard or touch, preset views, progress while computing, and the read-out beside it.
import { useCallback, useMemo, useState } from 'react';
import { Canvas, useThree } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import { canonicalJson } from '../../../../shared/spec/canonical-json';
import { useOrbitalGeometry } from '../hooks/use-orbital-geometry';
import { viewFromCamera, type ViewSettings } from '../utils/camera-pose';
import { presetView, type ViewPresetName } from '../utils/view-presets';
import { OrbitalReadout } from './orbital-readout';
import { OrbitalScene } from './orbital-scene';
import { ViewPresetButtons } from './view-preset-buttons';

export interface OrbitalViewportProps {
  spec: ResolvedFigureSpec;
  /** Called when the reader turns or zooms the figure, or picks a preset (to store it in the spec). */
  onViewChange?: (view: ViewSettings) => void;
  className?: string;
}

const VIEWPORT_LINE_PX = 1.5;
const VIEWPORT_POINT_PX = 2;
/** Keyboard steps: degrees per arrow key, zoom factor per + or −. */
const KEY_TURN_DEG = 15;
const KEY_ZOOM = 1.25;

/** The view after a key press on the figure, or null for keys the figure does not use. */
function viewAfterKey(view: ViewSettings, key: string): ViewSettings | null {
  const wrap = (deg: number): number => ((((deg + 180) % 360) + 360) % 360) - 180;
  switch (key) {
    case 'ArrowLeft':
      return { ...view, azimuthDeg: wrap(view.azimuthDeg - KEY_TURN_DEG) };
    case 'ArrowRight':
      return { ...view, azimuthDeg: wrap(view.azimuthDeg + KEY_TURN_DEG) };
    case 'ArrowUp':
      return { ...view, elevationDeg: Math.min(90, view.elevationDeg + KEY_TURN_DEG) };
    case 'ArrowDown':
      return { ...view, elevationDeg: Math.max(-90, view.elevationDeg - KEY_TURN_DEG) };
    case '+':
    case '=':
      return { ...view, zoom: Math.min(10, Math.round(view.zoom * KEY_ZOOM * 1000) / 1000) };
    case '-':
      return { ...view, zoom: Math.max(0.1, Math.round((view.zoom / KEY_ZOOM) * 1000) / 1000) };
    default:
      return null;
  }
}

function ViewControls({
  view,
  radius,
  onEnd,
}: {
  view: ViewSettings;
  radius: number;
  onEnd: (v: ViewSettings) => void;
}) {
  const size = useThree((s) => s.size);
  const camera = useThree((s) => s.camera);
  return (
    <OrbitControls
      makeDefault
      enablePan={false}
      enableDamping={false}
      onEnd={() =>
        onEnd(viewFromCamera(camera.position, camera.zoom, view, radius, size.width, size.height))
      }
    />
  );
}

export function OrbitalViewport({ spec, onViewChange, className }: OrbitalViewportProps) {
  const geometryState = useOrbitalGeometry(spec);
  const { geometry, status, progress, stage, error } = geometryState;
  // While a new figure is computed the last one stays on screen (under the progress bar), so the
  // scene and its HTML labels are not torn down and rebuilt on every edit.
  const [shown, setShown] = useState(geometry);
  if (geometry && geometry !== shown) setShown(geometry);
  // The view shown: the spec's, until the reader turns the figure or picks a preset.
  const specViewKey = canonicalJson(spec.view);
  const [local, setLocal] = useState<{ key: string; view: ViewSettings } | null>(null);
  const view = local && local.key === specViewKey ? local.view : spec.view;
  const changeView = useCallback(
    (next: ViewSettings) => {
      setLocal({ key: specViewKey, view: next });
      onViewChange?.(next);
    },
    [specViewKey, onViewChange],
  );
  const choosePreset = useCallback(
    (name: ViewPresetName) => changeView(presetView(name, view)),
    [changeView, view],
  );
  // A preset must re-pose the camera even if the numbers equal the last ones, so the scene keys on this object.
  const sceneSpec = useMemo(() => ({ ...spec, view }), [spec, view]);
  const notes = useMemo(() => {
    const list = [...geometryState.notes];
    if (view.projection === 'perspective' && spec.look.showScaleBar && geometry?.hasLength) {
      list.push('In perspective the scale bar holds at the depth of the nucleus only.');
    }
    return list;
  }, [geometryState.notes, view.projection, spec.look.showScaleBar, geometry]);

  return (
    <div className={className ?? 'flex flex-col gap-3 lg:flex-row'}>
      <div
        className="relative aspect-square w-full max-w-[640px] rounded border border-slate-200 bg-white focus-visible:outline-2 focus-visible:outline-slate-600"
        tabIndex={0}
        role="group"
        aria-label="3D figure: arrow keys turn it, + and − zoom"
        onKeyDown={(event) => {
          const next = viewAfterKey(view, event.key);
          if (!next) return;
          event.preventDefault();
          changeView(next);
        }}
      >
        <Canvas
          frameloop="demand"
          flat
          dpr={[1, 2]}
          gl={{ antialias: true, alpha: true }}
          aria-label={`3D view of ${geometry?.facts.label ?? 'the orbital'}; drag to turn, scroll to zoom`}
        >
          {shown ? (
            <>
              <OrbitalScene
                geometry={shown}
                spec={sceneSpec}
                domLabels
                lineWidthPx={VIEWPORT_LINE_PX}
                pointSizePx={VIEWPORT_POINT_PX}
              />
              <ViewControls view={view} radius={shown.radius} onEnd={changeView} />
            </>
          ) : null}
        </Canvas>
        {status === 'working' ? (
          <div
            role="progressbar"
            aria-label={`Computing: ${stage}`}
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={Math.round(100 * progress)}
            className="absolute inset-x-0 top-0 h-1 bg-slate-100"
          >
            <div
              className="h-1 bg-slate-600 transition-[width]"
              style={{ width: `${Math.round(100 * progress)}%` }}
            />
          </div>
        ) : null}
        {status === 'error' ? (
          <p
            role="alert"
            className="absolute inset-x-2 bottom-2 rounded bg-red-50 p-2 text-sm text-red-800"
          >
            {error}
          </p>
        ) : null}
      </div>
      <div className="flex min-w-56 flex-col gap-3">
        <ViewPresetButtons onChoose={choosePreset} />
        {geometryState.facts ? <OrbitalReadout facts={geometryState.facts} notes={notes} /> : null}
      </div>
    </div>
  );
}
