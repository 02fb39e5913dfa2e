// Lighting presets of the 3D figure. The lights ride with the camera (render this inside
// SceneCamera), so a lobe's shading does not change as the figure turns; 'flat' needs no lights
// because surfaces are then drawn unlit (see SurfaceMesh).
import { useMemo } from 'react';
import { Object3D } from 'three';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';

export type LightingPreset = FigureSpec['view']['lighting'];

export function SceneLighting({ preset }: { preset: LightingPreset }) {
  // Both lights aim at a point straight ahead of the camera, so their directions are fixed on screen.
  const target = useMemo(() => {
    const o = new Object3D();
    o.position.set(0, 0, -1);
    return o;
  }, []);
  if (preset === 'flat') return null;
  const bright = preset === 'bright';
  return (
    <>
      <primitive object={target} />
      <ambientLight intensity={bright ? 0.9 : 1.1} />
      {/* Key light from the upper left, fill from the lower right. */}
      <directionalLight position={[-1, 1.2, 1]} target={target} intensity={bright ? 2.6 : 1.7} />
      <directionalLight position={[1.2, -0.5, 1]} target={target} intensity={bright ? 0.9 : 0.45} />
    </>
  );
}
