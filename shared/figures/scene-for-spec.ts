/**
 * Wraps drawn nodes and metadata into the scene of a spec: page size, background and dpi come
 * from the resolved print settings, so every builder prints at exactly what the spec asks.
 */
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import type { FigureScene, SceneMetadata, SceneNode } from './scene';

export function sceneForSpec(
  spec: ResolvedFigureSpec,
  children: SceneNode[],
  metadata: SceneMetadata,
): FigureScene {
  return {
    widthMm: spec.print.widthMm,
    heightMm: spec.print.heightMm,
    background: spec.print.background,
    dpi: spec.print.dpi,
    children,
    metadata,
  };
}
