// The figure's camera, orthographic or perspective, posed from the spec's view (utils/camera-pose)
// and made the scene's default; its children (lights, scale bar) move with it.
import { useLayoutEffect, useRef, type ReactNode } from 'react';
import { useThree } from '@react-three/fiber';
import { OrthographicCamera, type PerspectiveCamera } from 'three';
import { cameraPose, PERSPECTIVE_FOV, type ViewSettings } from '../utils/camera-pose';

export interface SceneCameraProps {
  view: ViewSettings;
  /** Radius of what is drawn (bohr). */
  radius: number;
  children?: ReactNode;
}

type Controls = {
  target?: { set(x: number, y: number, z: number): void };
  update?: () => void;
} | null;

export function SceneCamera({ view, radius, children }: SceneCameraProps) {
  const set = useThree((s) => s.set);
  const get = useThree((s) => s.get);
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  const controls = useThree((s) => s.controls) as Controls;
  const cameraRef = useRef<OrthographicCamera | PerspectiveCamera>(null);

  useLayoutEffect(() => {
    const camera = cameraRef.current;
    if (!camera) return;
    const previous = get().camera;
    set({ camera });
    return () => set({ camera: previous });
  }, [view.projection, set, get]);

  useLayoutEffect(() => {
    const camera = cameraRef.current;
    if (!camera) return;
    const pose = cameraPose(view, radius, size.width, size.height);
    camera.position.set(pose.position.x, pose.position.y, pose.position.z);
    camera.up.set(pose.up.x, pose.up.y, pose.up.z);
    camera.near = pose.near;
    camera.far = pose.far;
    if (camera instanceof OrthographicCamera) {
      // A frustum in pixels, so zoom is pixels per bohr.
      camera.left = -size.width / 2;
      camera.right = size.width / 2;
      camera.top = size.height / 2;
      camera.bottom = -size.height / 2;
      camera.zoom = pose.pixelsPerBohr;
    } else {
      camera.aspect = size.width / size.height;
    }
    camera.lookAt(0, 0, 0);
    camera.updateProjectionMatrix();
    camera.updateMatrixWorld();
    controls?.target?.set(0, 0, 0);
    controls?.update?.();
    invalidate();
  }, [view, radius, size.width, size.height, controls, invalidate]);

  return view.projection === 'perspective' ? (
    <perspectiveCamera
      key="perspective"
      ref={cameraRef as React.Ref<PerspectiveCamera>}
      fov={PERSPECTIVE_FOV}
    >
      {children}
    </perspectiveCamera>
  ) : (
    <orthographicCamera key="orthographic" ref={cameraRef as React.Ref<OrthographicCamera>}>
      {children}
    </orthographicCamera>
  );
}
