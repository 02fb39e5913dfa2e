// Builds 2D figures (slice, radial plot, angular curve, level diagram) off the main thread: the
// same builders and SVG writer the print route uses, so the preview is the printed figure.
import { buildFigureScene } from '../../../../shared/figures/build-figure-scene';
import { sceneToSvg } from '../../../../shared/figures/scene-to-svg';
import type { SceneReply, SceneRequest } from './scene-messages';

self.onmessage = (event: MessageEvent<SceneRequest>) => {
  const { id, spec } = event.data;
  let reply: SceneReply;
  try {
    const scene = buildFigureScene(spec);
    reply = {
      id,
      type: 'done',
      scene: {
        svg: sceneToSvg(scene),
        title: scene.metadata.title,
        altText: scene.metadata.altText,
        facts: scene.metadata.facts,
        notes: scene.metadata.notes,
        widthMm: scene.widthMm,
        heightMm: scene.heightMm,
      },
    };
  } catch (error) {
    reply = { id, type: 'error', message: error instanceof Error ? error.message : String(error) };
  }
  self.postMessage(reply);
};
