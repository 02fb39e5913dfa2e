// The viewer's geometry worker: builds meshes and clouds off the main thread and hands the typed
// arrays over without copying (transfer list).
import { buildOrbitalGeometry } from '../utils/build-orbital-geometry';
import { meshBuffers } from '../utils/mesh-arrays';
import type { OrbitalGeometry, SurfaceSet } from '../utils/orbital-geometry';
import type { GeometryReply, GeometryRequest } from './geometry-messages';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const reply = (message: GeometryReply, transfer: Transferable[] = []): void =>
  scope.postMessage(message, transfer);

/** Progress messages at most this often (ms): enough for a progress bar, few enough not to flood the channel. */
const PROGRESS_INTERVAL = 60;

scope.onmessage = (event: MessageEvent<GeometryRequest>) => {
  const { id, spec } = event.data;
  let last = 0;
  try {
    const geometry = buildOrbitalGeometry(spec, (fraction, stage) => {
      const t = performance.now();
      if (t - last < PROGRESS_INTERVAL && fraction < 1) return;
      last = t;
      reply({ id, type: 'progress', fraction, stage });
    });
    reply({ id, type: 'done', geometry }, transferList(geometry));
  } catch (error) {
    reply({ id, type: 'error', message: error instanceof Error ? error.message : String(error) });
  }
};

function transferList(geometry: OrbitalGeometry): Transferable[] {
  const list: ArrayBuffer[] = [];
  const addSet = (set: SurfaceSet | null): void => {
    for (const mesh of [set?.positive, set?.negative, set?.phase])
      if (mesh) list.push(...meshBuffers(mesh));
  };
  addSet(geometry.surfaces);
  addSet(geometry.outer);
  if (geometry.nodalSheets) list.push(...meshBuffers(geometry.nodalSheets));
  if (geometry.cloud)
    list.push(
      geometry.cloud.positions.buffer as ArrayBuffer,
      geometry.cloud.phases.buffer as ArrayBuffer,
    );
  // A buffer may appear once only in a transfer list.
  return [...new Set(list)];
}
