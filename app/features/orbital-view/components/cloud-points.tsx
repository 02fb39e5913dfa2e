// The probability cloud as THREE.Points: one dot per sampled point, coloured by sign or phase.
import { useEffect, useMemo } from 'react';
import { PointsMaterial } from 'three';
import { usePointGeometry } from '../hooks/use-buffer-geometry';
import type { CloudPoints as CloudData } from '../utils/orbital-geometry';
import { phaseColours } from '../utils/phase-colour';

export interface CloudPointsProps {
  cloud: CloudData;
  isReal: boolean;
  positive: string;
  negative: string;
  opacity: number;
  /** Dot diameter in screen pixels. */
  sizePx: number;
}

export function CloudPoints({
  cloud,
  isReal,
  positive,
  negative,
  opacity,
  sizePx,
}: CloudPointsProps) {
  const colours = useMemo(
    () => phaseColours(cloud.phases, positive, negative, isReal),
    [cloud, positive, negative, isReal],
  );
  const geometry = usePointGeometry(cloud.positions, colours);
  const material = useMemo(
    () =>
      new PointsMaterial({
        size: sizePx,
        sizeAttenuation: false,
        vertexColors: true,
        transparent: opacity < 1,
        opacity,
        depthWrite: opacity >= 1,
      }),
    [sizePx, opacity],
  );
  useEffect(() => () => material.dispose(), [material]);
  if (!geometry) return null;
  return <points geometry={geometry} material={material} />;
}
