// Angular nodal planes and cones as thin translucent sheets that never hide the lobes behind them.
import { useEffect, useMemo } from 'react';
import { DoubleSide, MeshBasicMaterial } from 'three';
import { useMeshGeometry } from '../hooks/use-buffer-geometry';
import type { MeshArrays } from '../utils/mesh-arrays';

const SHEET_COLOUR = '#64748b';
const SHEET_OPACITY = 0.2;

export function NodalSheets({ mesh }: { mesh: MeshArrays | null }) {
  const geometry = useMeshGeometry(mesh);
  const material = useMemo(
    () =>
      new MeshBasicMaterial({
        color: SHEET_COLOUR,
        transparent: true,
        opacity: SHEET_OPACITY,
        side: DoubleSide,
        depthWrite: false,
      }),
    [],
  );
  useEffect(() => () => material.dispose(), [material]);
  if (!geometry) return null;
  return <mesh geometry={geometry} material={material} renderOrder={3} />;
}
