// Messages between the viewer and its geometry worker.
import type { GeometrySpec } from '../utils/build-orbital-geometry';
import type { OrbitalGeometry } from '../utils/orbital-geometry';

export interface GeometryRequest {
  readonly id: number;
  readonly spec: GeometrySpec;
}

export type GeometryReply =
  | {
      readonly id: number;
      readonly type: 'progress';
      readonly fraction: number;
      readonly stage: string;
    }
  | { readonly id: number; readonly type: 'done'; readonly geometry: OrbitalGeometry }
  | { readonly id: number; readonly type: 'error'; readonly message: string };
