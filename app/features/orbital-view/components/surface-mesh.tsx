// One surface of the figure: an isosurface phase, an outer translucent surface, or a part of an
// angular plot; one colour, or colours by phase when the mesh carries arg ψ per vertex.
import { useEffect, useMemo } from 'react';
import { DoubleSide, FrontSide, MeshBasicMaterial, MeshPhongMaterial, type Material } from 'three';
import { useMeshGeometry } from '../hooks/use-buffer-geometry';
import type { MeshArrays } from '../utils/mesh-arrays';
import { phaseColours } from '../utils/phase-colour';
import type { LightingPreset } from './scene-lighting';

export interface SurfaceMeshProps {
  mesh: MeshArrays | null;
  colour: string;
  /** Colours for arg ψ when the mesh has phases. */
  phaseColour?: { positive: string; negative: string };
  opacity: number;
  lighting: LightingPreset;
  /** Outer surfaces are drawn after the inner ones and do not hide them in the depth buffer. */
  translucentLayer?: boolean;
}

export function SurfaceMesh({
  mesh,
  colour,
  phaseColour,
  opacity,
  lighting,
  translucentLayer = false,
}: SurfaceMeshProps) {
  const colours = useMemo(
    () =>
      mesh?.phases && phaseColour
        ? phaseColours(mesh.phases, phaseColour.positive, phaseColour.negative, false)
        : null,
    [mesh, phaseColour],
  );
  const geometry = useMeshGeometry(mesh, colours);
  const translucent = opacity < 1 || translucentLayer;
  const material = useMemo<Material>(() => {
    const common = {
      color: colours ? '#ffffff' : colour,
      vertexColors: colours !== null,
      transparent: translucent,
      opacity,
      depthWrite: !translucentLayer,
      side: translucent ? DoubleSide : FrontSide,
    };
    if (lighting === 'flat') return new MeshBasicMaterial(common);
    return new MeshPhongMaterial({
      ...common,
      shininess: lighting === 'bright' ? 60 : 28,
      specular: lighting === 'bright' ? '#555555' : '#2a2a2a',
    });
  }, [colour, colours, opacity, lighting, translucent, translucentLayer]);
  useEffect(() => () => material.dispose(), [material]);
  if (!geometry) return null;
  return <mesh geometry={geometry} material={material} renderOrder={translucentLayer ? 2 : 0} />;
}
