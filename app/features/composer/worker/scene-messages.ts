// Messages between the composer and its 2D figure worker.
import type { SceneFact } from '../../../../shared/figures/scene';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';

export interface SceneRequest {
  id: number;
  spec: ResolvedFigureSpec;
}

export interface DrawnScene {
  svg: string;
  title: string;
  altText: string;
  facts: SceneFact[];
  notes: string[];
  widthMm: number;
  heightMm: number;
}

export type SceneReply =
  { id: number; type: 'done'; scene: DrawnScene } | { id: number; type: 'error'; message: string };
