/**
 * The main thread's side of the geometry worker: one worker, results cached per spec (canonical
 * JSON of what the geometry depends on), and cancellation: a request for another figure while one
 * is being computed terminates the busy worker (its work is synchronous and cannot be interrupted
 * otherwise) and starts a fresh one; a request for the figure already being computed joins it.
 */
import { canonicalJson } from '../../../../shared/spec/canonical-json';
import type { GeometrySpec } from '../utils/build-orbital-geometry';
import type { OrbitalGeometry } from '../utils/orbital-geometry';
import type { GeometryReply, GeometryRequest } from './geometry-messages';

/** Figures kept in memory (a large isosurface is a few MB). */
const CACHE_SIZE = 12;

export class GeometryCancelledError extends Error {
  override readonly name = 'GeometryCancelledError';
}

/** The part of a spec the geometry depends on; view, colours and print settings are left out. */
export function geometryKey(spec: GeometrySpec): string {
  return canonicalJson({
    system: spec.system,
    state: spec.state,
    kind: spec.kind,
    nodal: spec.look.showNodalSurfaces,
  });
}

interface Pending {
  id: number;
  key: string;
  promise: Promise<OrbitalGeometry>;
  resolve: (g: OrbitalGeometry) => void;
  reject: (e: Error) => void;
  /** Everyone waiting for this figure (a second request for the same figure joins the first). */
  listeners: Set<(fraction: number, stage: string) => void>;
}

const cache = new Map<string, OrbitalGeometry>();
let worker: Worker | null = null;
let pending: Pending | null = null;
let nextId = 1;

function startWorker(): Worker {
  const w = new Worker(new URL('./orbital-worker.ts', import.meta.url), { type: 'module' });
  w.onmessage = (event: MessageEvent<GeometryReply>) => {
    const message = event.data;
    if (!pending || message.id !== pending.id) return;
    if (message.type === 'progress') {
      for (const listener of pending.listeners) listener(message.fraction, message.stage);
      return;
    }
    const done = pending;
    pending = null;
    if (message.type === 'done') {
      remember(done.key, message.geometry);
      done.resolve(message.geometry);
    } else done.reject(new Error(message.message));
  };
  w.onerror = (event) => {
    const failed = pending;
    pending = null;
    worker?.terminate();
    worker = null;
    failed?.reject(new Error(event.message || 'the geometry worker stopped'));
  };
  return w;
}

function remember(key: string, geometry: OrbitalGeometry): void {
  cache.delete(key);
  cache.set(key, geometry);
  while (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
}

export function cachedGeometry(spec: GeometrySpec): OrbitalGeometry | null {
  return cache.get(geometryKey(spec)) ?? null;
}

export function requestGeometry(
  spec: GeometrySpec,
  onProgress: (fraction: number, stage: string) => void,
): Promise<OrbitalGeometry> {
  const key = geometryKey(spec);
  const hit = cache.get(key);
  if (hit) {
    remember(key, hit);
    return Promise.resolve(hit);
  }
  if (pending && pending.key === key) {
    pending.listeners.add(onProgress);
    return pending.promise;
  }
  if (pending) {
    const superseded = pending;
    pending = null;
    worker?.terminate();
    worker = null;
    superseded.reject(new GeometryCancelledError('a newer figure was asked for'));
  }
  worker ??= startWorker();
  const id = nextId++;
  let resolve!: (g: OrbitalGeometry) => void;
  let reject!: (e: Error) => void;
  const promise = new Promise<OrbitalGeometry>((yes, no) => {
    resolve = yes;
    reject = no;
  });
  pending = { id, key, promise, resolve, reject, listeners: new Set([onProgress]) };
  const request: GeometryRequest = {
    id,
    spec: { system: spec.system, state: spec.state, kind: spec.kind, look: spec.look },
  };
  worker.postMessage(request);
  return promise;
}
