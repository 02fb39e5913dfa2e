// The 2D figure for a resolved spec, drawn in the worker: the last finished drawing stays on
// screen while the next one is made, so the preview never goes blank between edits.
import { useEffect, useState } from 'react';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import type { DrawnScene } from '../worker/scene-messages';
import { cachedScene, requestScene, SceneCancelledError, sceneKey } from '../worker/scene-client';

export interface FigureSceneState {
  status: 'idle' | 'working' | 'ready' | 'error';
  scene: DrawnScene | null;
  error: string | null;
}

export function useFigureScene(spec: ResolvedFigureSpec | null): FigureSceneState {
  const key = spec ? sceneKey(spec) : null;
  const [done, setDone] = useState<{
    key: string;
    scene: DrawnScene | null;
    error: string | null;
  } | null>(null);
  const [lastScene, setLastScene] = useState<DrawnScene | null>(null);
  const hit = spec ? cachedScene(spec) : null;

  useEffect(() => {
    if (!spec || !key || cachedScene(spec)) return;
    let live = true;
    requestScene(spec).then(
      (scene) => {
        if (!live) return;
        setLastScene(scene);
        setDone({ key, scene, error: null });
      },
      (error: Error) => {
        if (live && !(error instanceof SceneCancelledError))
          setDone({ key, scene: null, error: error.message });
      },
    );
    return () => {
      live = false;
    };
    // The key holds everything the drawing depends on.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  if (!spec) return { status: 'idle', scene: null, error: null };
  if (hit) return { status: 'ready', scene: hit, error: null };
  if (done?.key === key && done.error)
    return { status: 'error', scene: lastScene, error: done.error };
  return { status: 'working', scene: lastScene, error: null };
}
