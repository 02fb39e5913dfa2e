// The 3D figure's geometry for a spec, computed in the worker: status, progress, result, facts and notes.
import { useEffect, useState } from 'react';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import {
  cachedGeometry,
  geometryKey,
  GeometryCancelledError,
  requestGeometry,
} from '../worker/geometry-client';
import type { OrbitalFacts, OrbitalGeometry } from '../utils/orbital-geometry';

export type GeometryStatus = 'idle' | 'working' | 'ready' | 'error';

export interface OrbitalGeometryState {
  status: GeometryStatus;
  /** 0 … 1 while working. */
  progress: number;
  stage: string;
  /** The figure to show: the one asked for when ready, else the last one ready (kept while the next is computed). */
  geometry: OrbitalGeometry | null;
  facts: OrbitalFacts | null;
  notes: readonly string[];
  error: string | null;
}

interface Request {
  key: string;
  progress: number;
  stage: string;
  error: string | null;
}

export function useOrbitalGeometry(spec: ResolvedFigureSpec | null): OrbitalGeometryState {
  const key = spec ? geometryKey(spec) : null;
  const [request, setRequest] = useState<Request | null>(null);
  const [lastReady, setLastReady] = useState<OrbitalGeometry | null>(null);
  const hit = spec ? cachedGeometry(spec) : null;

  useEffect(() => {
    if (!spec || !key || cachedGeometry(spec)) return;
    let live = true;
    requestGeometry(spec, (progress, stage) => {
      if (live) setRequest({ key, progress, stage, error: null });
    }).then(
      (geometry) => {
        if (!live) return;
        setLastReady(geometry);
        setRequest({ key, progress: 1, stage: 'done', error: null });
      },
      (error: Error) => {
        if (live && !(error instanceof GeometryCancelledError))
          setRequest({ key, progress: 0, stage: '', error: error.message });
      },
    );
    return () => {
      live = false;
    };
    // The key holds everything the geometry depends on.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  if (!spec)
    return {
      status: 'idle',
      progress: 0,
      stage: '',
      geometry: null,
      facts: null,
      notes: [],
      error: null,
    };
  if (hit)
    return {
      status: 'ready',
      progress: 1,
      stage: 'done',
      geometry: hit,
      facts: hit.facts,
      notes: hit.notes,
      error: null,
    };
  const current = request?.key === key ? request : null;
  const shown = lastReady;
  if (current?.error)
    return {
      status: 'error',
      progress: 0,
      stage: '',
      geometry: null,
      facts: null,
      notes: [],
      error: current.error,
    };
  return {
    status: 'working',
    progress: current?.progress ?? 0,
    stage: current?.stage ?? 'starting',
    geometry: shown,
    facts: shown?.facts ?? null,
    notes: shown?.notes ?? [],
    error: null,
  };
}
