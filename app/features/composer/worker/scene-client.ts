/**
 * The main thread's side of the 2D figure worker: results cached per resolved spec, and a newer
 * request replaces a busy one (the busy worker is ended: its work is synchronous and cannot be
 * interrupted otherwise), so quick edits never queue up behind a slow slice.
 */
import { canonicalJson } from '../../../../shared/spec/canonical-json';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import type { DrawnScene, SceneReply, SceneRequest } from './scene-messages';

const CACHE_SIZE = 24;

export class SceneCancelledError extends Error {
  override readonly name = 'SceneCancelledError';
}

const cache = new Map<string, DrawnScene>();
let worker: Worker | null = null;
let busy: {
  id: number;
  key: string;
  promise: Promise<DrawnScene>;
  reject: (e: Error) => void;
} | null = null;
let nextId = 1;

export const sceneKey = (spec: ResolvedFigureSpec): string => canonicalJson(spec);

export function cachedScene(spec: ResolvedFigureSpec): DrawnScene | null {
  return cache.get(sceneKey(spec)) ?? null;
}

export function requestScene(spec: ResolvedFigureSpec): Promise<DrawnScene> {
  const key = sceneKey(spec);
  const hit = cache.get(key);
  if (hit) return Promise.resolve(hit);
  if (busy?.key === key) return busy.promise;
  if (busy) {
    worker?.terminate();
    worker = null;
    busy.reject(new SceneCancelledError('replaced by a newer figure'));
    busy = null;
  }
  worker ??= new Worker(new URL('./scene-worker.ts', import.meta.url), { type: 'module' });
  const w = worker;
  const id = nextId++;
  let reject!: (e: Error) => void;
  const promise = new Promise<DrawnScene>((resolve, rej) => {
    reject = rej;
    w.onmessage = (event: MessageEvent<SceneReply>) => {
      const reply = event.data;
      if (reply.id !== id) return;
      busy = null;
      if (reply.type === 'done') {
        cache.set(key, reply.scene);
        if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
        resolve(reply.scene);
      } else rej(new Error(reply.message));
    };
    w.onerror = (event) => {
      busy = null;
      worker = null;
      w.terminate();
      rej(new Error(event.message || 'the figure could not be drawn'));
    };
  });
  busy = { id, key, promise, reject };
  w.postMessage({ id, spec } satisfies SceneRequest);
  return promise;
}
