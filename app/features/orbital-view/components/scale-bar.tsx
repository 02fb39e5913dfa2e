// The scale bar, drawn in the camera's frame so it stays in the lower left corner whatever the
// view; its length is a round number in the figure's unit (utils/scale-bar-layout). In perspective
// it holds at the depth of the nucleus. Updated only when the scale on screen changes.
import { useRef, useState } from 'react';
import { useFrame } from '@react-three/fiber';
import { Html, Line } from '@react-three/drei';
import { OrthographicCamera, PerspectiveCamera, type Group } from 'three';
import { scaleBarLayout, type LengthUnit, type ScaleBarLayout } from '../utils/scale-bar-layout';

export interface ScaleBarProps {
  unit: LengthUnit;
  colour: string;
  lineWidthPx: number;
  /** Show the length as a DOM label (interactive view); print places a vector label instead. */
  domLabel: boolean;
  onLayout?: (layout: ScaleBarLayout) => void;
}

/** Pixels per bohr at the nucleus for the current camera. */
export function pixelsPerBohrAtNucleus(
  camera: OrthographicCamera | PerspectiveCamera,
  heightPx: number,
): number {
  if (camera instanceof OrthographicCamera) return camera.zoom;
  const depth = camera.position.length();
  return heightPx / (2 * depth * Math.tan((camera.fov * Math.PI) / 360));
}

const TICK_PX = 5;
const BAR_POINTS: [number, number, number][] = [
  [0, 0, 0],
  [1, 0, 0],
  [0, -1, 0],
  [0, 1, 0],
  [1, -1, 0],
  [1, 1, 0],
];

export function ScaleBar({ unit, colour, lineWidthPx, domLabel, onLayout }: ScaleBarProps) {
  const group = useRef<Group>(null);
  const last = useRef({ scale: 0, width: 0, height: 0 });
  const [label, setLabel] = useState('');

  useFrame((state) => {
    const camera = state.camera as OrthographicCamera | PerspectiveCamera;
    const { width, height } = state.size;
    const scale = pixelsPerBohrAtNucleus(camera, height);
    const seen = last.current;
    if (!group.current || (scale === seen.scale && width === seen.width && height === seen.height))
      return;
    seen.scale = scale;
    seen.width = width;
    seen.height = height;
    const layout = scaleBarLayout(scale, width, height, unit);
    const depth =
      camera instanceof OrthographicCamera
        ? (camera.near + camera.far) / 2
        : camera.position.length();
    // Camera space: x right, y up, looking down −z; 1 pixel = 1/scale bohr at the nucleus's depth.
    group.current.position.set(
      (layout.from[0] - width / 2) / scale,
      (height / 2 - layout.from[1]) / scale,
      -depth,
    );
    group.current.scale.set(layout.lengthBohr, TICK_PX / scale, 1);
    if (layout.label !== label) setLabel(layout.label);
    onLayout?.(layout);
  });

  return (
    <group ref={group} renderOrder={10}>
      <Line
        points={BAR_POINTS}
        segments
        color={colour}
        lineWidth={lineWidthPx}
        depthTest={false}
        renderOrder={10}
      />
      {domLabel && label ? (
        <Html position={[0.5, 3, 0]} center style={{ pointerEvents: 'none' }}>
          <span className="whitespace-nowrap text-xs text-slate-800 [text-shadow:0_0_3px_white,0_0_3px_white]">
            {label}
          </span>
        </Html>
      ) : null}
    </group>
  );
}
