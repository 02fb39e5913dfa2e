// three.js geometry for a mesh or point set from the worker, built once per input and disposed when replaced.
import { useEffect, useMemo } from 'react';
import { BufferAttribute, BufferGeometry } from 'three';
import type { MeshArrays } from '../utils/mesh-arrays';

export function useMeshGeometry(
  mesh: MeshArrays | null,
  colours: Float32Array | null = null,
): BufferGeometry | null {
  const geometry = useMemo(() => {
    if (!mesh) return null;
    const g = new BufferGeometry();
    g.setAttribute('position', new BufferAttribute(mesh.positions, 3));
    g.setAttribute('normal', new BufferAttribute(mesh.normals, 3));
    if (colours) g.setAttribute('color', new BufferAttribute(colours, 3));
    g.setIndex(new BufferAttribute(mesh.indices, 1));
    g.computeBoundingSphere();
    return g;
  }, [mesh, colours]);
  useEffect(() => () => geometry?.dispose(), [geometry]);
  return geometry;
}

export function usePointGeometry(
  positions: Float32Array | null,
  colours: Float32Array | null,
): BufferGeometry | null {
  const geometry = useMemo(() => {
    if (!positions) return null;
    const g = new BufferGeometry();
    g.setAttribute('position', new BufferAttribute(positions, 3));
    if (colours) g.setAttribute('color', new BufferAttribute(colours, 3));
    g.computeBoundingSphere();
    return g;
  }, [positions, colours]);
  useEffect(() => () => geometry?.dispose(), [geometry]);
  return geometry;
}
