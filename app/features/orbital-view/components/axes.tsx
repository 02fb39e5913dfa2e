// Cartesian axes of the physics frame through the nucleus, drawn in the three.js frame
// (shared/physics/coordinates), with x, y, z labels at the positive ends in the interactive view.
import { useMemo } from 'react';
import { Html, Line } from '@react-three/drei';
import { physicsToThree } from '../../../../shared/physics/coordinates';

export const AXIS_NAMES = ['x', 'y', 'z'] as const;
/** Axis half-length as a multiple of the figure's radius. */
export const AXIS_REACH = 1.15;
/** Labels sit a little beyond the axis ends so the line does not run through them. */
const LABEL_OFFSET = 1.07;

/** Positive end of each physics axis in the three.js frame. */
export function axisEnds(radius: number): [number, number, number][] {
  const L = radius * AXIS_REACH;
  return [
    [L, 0, 0],
    [0, L, 0],
    [0, 0, L],
  ].map(([x, y, z]) => {
    const p = physicsToThree(x, y, z);
    return [p.x, p.y, p.z];
  });
}

export function Axes({
  radius,
  colour,
  lineWidthPx,
  labels,
}: {
  radius: number;
  colour: string;
  lineWidthPx: number;
  labels: boolean;
}) {
  const ends = useMemo(() => axisEnds(radius), [radius]);
  const points = useMemo(
    () => ends.flatMap((e) => [[-e[0], -e[1], -e[2]] as [number, number, number], e]),
    [ends],
  );
  return (
    <group>
      <Line points={points} segments color={colour} lineWidth={lineWidthPx} />
      {labels
        ? ends.map((end, i) => (
            <Html
              key={AXIS_NAMES[i]}
              position={[end[0] * LABEL_OFFSET, end[1] * LABEL_OFFSET, end[2] * LABEL_OFFSET]}
              center
              style={{ pointerEvents: 'none' }}
            >
              <span className="font-serif text-base italic text-slate-800 [text-shadow:0_0_3px_white,0_0_3px_white]">
                {AXIS_NAMES[i]}
              </span>
            </Html>
          ))
        : null}
    </group>
  );
}
