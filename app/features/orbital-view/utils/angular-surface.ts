/**
 * The polar surface of an angular function: the point r̂·|F(r̂)| for every direction r̂, with
 * F = Σ_k c_k S_k(r̂) the angular factors of the state's real-basis terms (Re F for quantity "real",
 * |F| for "abs"). Triangles where F ≥ 0 and where F < 0 go to separate index lists, so the two
 * signs take the two phase colours; the surface passes through the nucleus on the nodal cones and
 * planes, where the two parts meet.
 *
 * Method: a latitude–longitude net of directions in the physics frame (one vertex at each pole,
 * the φ seam closed by wrapping indices so the shading has no crease), converted to the three.js
 * frame; normals from the faces. Source of S_lm: ../../../../shared/physics/solid-harmonic
 * (REFERENCE.md §5 convention).
 */
import type { CompiledState } from '../../../../shared/physics/orbital-state';
import { solidHarmonicValue } from '../../../../shared/physics/solid-harmonic';
import { physicsTriplesToThree, vertexNormals, type MeshArrays } from './mesh-arrays';

export interface AngularSurface {
  /** The F ≥ 0 part; for |F| of a complex state the whole surface, with arg F per vertex. */
  readonly positive: MeshArrays;
  readonly negative: MeshArrays | null;
  /** Largest |F| over the net (the surface's radius, in the dimensionless units of S_lm). */
  readonly maxRadius: number;
  /** True when the terms do not share one (n, l): F then mixes angular factors of different shells. */
  readonly mixesShells: boolean;
}

/** Directions per half-turn of latitude; 2× along the azimuth: 180 × 360 ≈ 65 000 vertices. */
const LATITUDES = 180;

export function buildAngularSurface(
  c: CompiledState,
  quantity: 'abs' | 'real',
  latitudes = LATITUDES,
): AngularSurface {
  const longitudes = 2 * latitudes;
  const ringCount = latitudes - 1;
  const vertexCount = 2 + ringCount * longitudes;
  const positions = new Float32Array(3 * vertexCount);
  const values = new Float64Array(vertexCount);
  // |F| of a complex state carries arg F per vertex, for colouring by phase.
  const phases = quantity === 'abs' && !c.isReal ? new Float32Array(vertexCount) : null;
  const terms = c.realTerms;
  let maxRadius = 0;

  const put = (v: number, x: number, y: number, z: number): void => {
    let re = 0;
    let im = 0;
    for (const term of terms) {
      const s = solidHarmonicValue(term.harmonic, x, y, z, 1);
      re += term.coefficient.re * s;
      im += term.coefficient.im * s;
    }
    const value = quantity === 'real' ? re : Math.hypot(re, im);
    const radius = Math.abs(value);
    values[v] = value;
    if (phases) phases[v] = Math.atan2(im, re);
    positions[3 * v] = x * radius;
    positions[3 * v + 1] = y * radius;
    positions[3 * v + 2] = z * radius;
    if (radius > maxRadius) maxRadius = radius;
  };

  put(0, 0, 0, 1);
  for (let i = 1; i <= ringCount; i++) {
    const theta = (Math.PI * i) / latitudes;
    const st = Math.sin(theta);
    const ct = Math.cos(theta);
    for (let j = 0; j < longitudes; j++) {
      const phi = (2 * Math.PI * j) / longitudes;
      put(1 + (i - 1) * longitudes + j, st * Math.cos(phi), st * Math.sin(phi), ct);
    }
  }
  const south = vertexCount - 1;
  put(south, 0, 0, -1);

  // Counter-clockwise seen from outside in the physics frame (θ down, φ round: north-pole fan first).
  const triangles: number[] = [];
  const ring = (i: number, j: number): number => 1 + (i - 1) * longitudes + (j % longitudes);
  for (let j = 0; j < longitudes; j++) triangles.push(0, ring(1, j), ring(1, j + 1));
  for (let i = 1; i < ringCount; i++) {
    for (let j = 0; j < longitudes; j++) {
      const a = ring(i, j);
      const b = ring(i + 1, j);
      const d = ring(i, j + 1);
      const e = ring(i + 1, j + 1);
      triangles.push(a, b, e, a, e, d);
    }
  }
  for (let j = 0; j < longitudes; j++)
    triangles.push(south, ring(ringCount, j + 1), ring(ringCount, j));

  const positiveList: number[] = [];
  const negativeList: number[] = [];
  for (let t = 0; t < triangles.length; t += 3) {
    const sum = values[triangles[t]] + values[triangles[t + 1]] + values[triangles[t + 2]];
    (sum >= 0 ? positiveList : negativeList).push(triangles[t], triangles[t + 1], triangles[t + 2]);
  }
  physicsTriplesToThree(positions);
  const allIndices = Uint32Array.from(triangles);
  const normals = vertexNormals(positions, allIndices);
  // Both parts share the vertex arrays' contents; each gets its own copy so both can be transferred.
  const part = (list: number[]): MeshArrays => ({
    positions: positions.slice(),
    normals: normals.slice(),
    indices: Uint32Array.from(list),
    phases: phases ? phases.slice() : null,
  });
  const shells = new Set(terms.map((t) => `${t.n},${t.l}`));
  return {
    positive: part(positiveList),
    negative: negativeList.length > 0 ? part(negativeList) : null,
    maxRadius,
    mixesShells: new Set(terms.map((t) => t.l)).size > 1 || shells.size > 1,
  };
}
