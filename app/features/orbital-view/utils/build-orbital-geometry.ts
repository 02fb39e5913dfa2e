/**
 * Computes everything a 3D figure draws from a resolved spec: the isosurface (both phases, and an
 * optional outer surface), the probability cloud or the angular polar surface, the nodal sheets of
 * a single orbital, the facts and the notes. Pure computation with typed-array results: it runs in
 * the viewer's Web Worker and, for print, on the page's main thread.
 */
import { compileState, type CompiledState } from '../../../../shared/physics/orbital-state';
import { angularNodes } from '../../../../shared/physics/angular-nodes';
import { orbitalLabel } from '../../../../shared/physics/orbital-labels';
import { buildIsosurface, type Isosurface } from '../../../../shared/grid/build-isosurface';
import type { TriangleMesh } from '../../../../shared/grid/triangle-mesh';
import { sampleCloud } from '../../../../shared/sampling/sample-cloud';
import type { ResolvedFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import { buildAngularSurface } from './angular-surface';
import { buildNodalSheets } from './nodal-sheets';
import { physicsTriplesToThree, type MeshArrays } from './mesh-arrays';
import type { OrbitalFacts, OrbitalGeometry, SurfaceSet } from './orbital-geometry';
import { orbitalStateOf } from '../../../../shared/figures/figure-system';

export type GeometrySpec = Pick<ResolvedFigureSpec, 'system' | 'state' | 'kind' | 'look'>;
export type ProgressReport = (fraction: number, stage: string) => void;

/** Radius of the cloud's framing sphere: this quantile of the point radii (outliers would shrink the picture). */
const CLOUD_FRAMING_QUANTILE = 0.995;
/** Warn when the grid's enclosed fraction misses the request by more than this (absolute). */
const ENCLOSED_WARNING = 0.005;

const now = (): number => globalThis.performance?.now() ?? Date.now();

export class FigureKindError extends Error {
  override readonly name = 'FigureKindError';
}

export function buildOrbitalGeometry(
  spec: GeometrySpec,
  onProgress: ProgressReport = () => {},
): OrbitalGeometry {
  const started = now();
  const kind = spec.kind;
  if (kind.type !== 'isosurface' && kind.type !== 'cloud' && kind.type !== 'angular') {
    throw new FigureKindError(
      `kind.type: "${kind.type}" is a 2D figure; the 3D view draws isosurface, cloud and angular`,
    );
  }
  if (kind.type === 'angular' && kind.mode !== 'surface') {
    throw new FigureKindError(
      'kind.mode: the 3D view draws angular plots in mode "surface"; "curve" is a 2D figure',
    );
  }
  onProgress(0, 'compiling the state');
  const state = compileState(orbitalStateOf(spec));
  const single = singleOrbital(state);
  const notes: string[] = [];
  const base = {
    label: single
      ? orbitalLabel(single.n, single.l, single.m, single.basis).text
      : `superposition of ${spec.state.terms.length} terms`,
    isReal: state.isReal,
    nodes: single
      ? {
          radial: single.n - single.l - 1,
          angular: angularNodes(single.l, single.m, single.basis).count,
        }
      : null,
  };
  const phaseNote = 'ψ is complex here: colours show the phase arg ψ, not a sign.';
  // Complex states are coloured by phase (isosurface, cloud, |F| angular plots).
  if (!state.isReal && !(kind.type === 'angular' && kind.quantity === 'real'))
    notes.push(phaseNote);

  let geometry: Omit<OrbitalGeometry, 'nodalSheets' | 'notes' | 'facts'> & {
    facts: Omit<OrbitalFacts, 'ms'>;
  };
  if (kind.type === 'isosurface') {
    onProgress(0.05, 'sampling ψ on the grid');
    const surface = buildIsosurface(state, {
      enclosed: kind.enclosed,
      grid: kind.grid,
      extent: kind.extent,
    });
    let outerSurface: Isosurface | null = null;
    if (kind.outerSurface) {
      onProgress(0.5, 'outer surface');
      outerSurface = buildIsosurface(state, {
        enclosed: kind.outerSurface.enclosed,
        grid: kind.grid,
        extent: surface.grid.half,
      });
    }
    onProgress(0.9, 'packing meshes');
    const surfaces = surfaceSet(surface);
    const outer = outerSurface ? surfaceSet(outerSurface) : null;
    const outerTriangles = outerSurface ? totalTriangles(outerSurface) : 0;
    if (Math.abs(surface.enclosed - kind.enclosed) > ENCLOSED_WARNING) {
      notes.push(
        `The grid gives ${percent(surface.enclosed)} inside the surface for the ${percent(kind.enclosed)} asked for: refine the grid for a closer match.`,
      );
    }
    if (surface.clippedByGrid || outerSurface?.clippedByGrid) {
      notes.push(
        'The surface reaches the edge of the computed cube and is cut open there: enlarge the extent.',
      );
    }
    if (surface.gridTotal < 0.99) {
      notes.push(
        `The computed cube holds only ${percent(surface.gridTotal)} of the probability: enlarge the extent.`,
      );
    }
    geometry = {
      kind: 'isosurface',
      radius: Math.max(meshRadius(surfaces), outer ? meshRadius(outer) : 0) || surface.grid.half,
      hasLength: true,
      surfaces,
      outer,
      cloud: null,
      facts: {
        ...base,
        kind: 'isosurface',
        enclosed: { requested: kind.enclosed, achieved: surface.enclosed },
        densityLevel: surface.densityLevel,
        psiLevel: surface.psiLevel,
        gridTotal: surface.gridTotal,
        grid: { pointsPerAxis: surface.grid.n, halfWidthBohr: surface.grid.half },
        clippedByGrid: surface.clippedByGrid || Boolean(outerSurface?.clippedByGrid),
        outer:
          outerSurface && kind.outerSurface
            ? {
                requested: kind.outerSurface.enclosed,
                achieved: outerSurface.enclosed,
                densityLevel: outerSurface.densityLevel,
              }
            : null,
        triangles: {
          positive: surface.triangles.positive,
          negative: surface.triangles.negative,
          phase: surface.triangles.magnitude,
          outer: outerTriangles,
          total: totalTriangles(surface) + outerTriangles,
        },
        points: null,
        acceptance: null,
        seed: null,
      },
    };
  } else if (kind.type === 'cloud') {
    const cloud = sampleCloud(state, {
      count: kind.points,
      seed: kind.seed,
      onProgress: (done) => onProgress(0.05 + (0.9 * done) / kind.points, 'drawing points'),
    });
    const radii = new Float32Array(cloud.count);
    for (let i = 0; i < cloud.count; i++)
      radii[i] = Math.hypot(
        cloud.positions[3 * i],
        cloud.positions[3 * i + 1],
        cloud.positions[3 * i + 2],
      );
    radii.sort();
    notes.push(
      `Each point is drawn at random from |ψ|² (seed ${kind.seed}): the density of points shows the probability; the cloud has no edge.`,
    );
    geometry = {
      kind: 'cloud',
      radius: radii[Math.min(cloud.count - 1, Math.floor(CLOUD_FRAMING_QUANTILE * cloud.count))],
      hasLength: true,
      surfaces: null,
      outer: null,
      cloud: {
        positions: physicsTriplesToThree(cloud.positions),
        phases: cloud.phases,
        count: cloud.count,
      },
      facts: {
        ...base,
        ...emptyFacts,
        kind: 'cloud',
        points: cloud.count,
        acceptance: cloud.count / cloud.candidates,
        seed: kind.seed,
      },
    };
  } else {
    onProgress(0.05, 'angular surface');
    const angular = buildAngularSurface(state, kind.quantity);
    notes.push(
      'An angular plot shows how ψ depends on direction only: its size is not a length, so it has no scale bar.',
    );
    if (angular.mixesShells)
      notes.push(
        'The terms belong to different shells (n, l): the plot adds their angular factors and leaves out the radial parts, so it is not the shape of ψ at any one radius.',
      );
    if (!state.isReal && kind.quantity === 'real') {
      notes.push('ψ is complex here: the plot shows the real part of its angular factor.');
    }
    const byPhase = angular.positive.phases !== null;
    const surfaces: SurfaceSet = {
      positive: byPhase ? null : angular.positive,
      negative: angular.negative,
      phase: byPhase ? angular.positive : null,
    };
    geometry = {
      kind: 'angular',
      radius: angular.maxRadius,
      hasLength: false,
      surfaces,
      outer: null,
      cloud: null,
      facts: {
        ...base,
        ...emptyFacts,
        kind: 'angular',
        triangles: {
          ...emptyFacts.triangles,
          positive: byPhase ? 0 : angular.positive.indices.length / 3,
          negative: (angular.negative?.indices.length ?? 0) / 3,
          phase: byPhase ? angular.positive.indices.length / 3 : 0,
          total: angular.positive.indices.length / 3 + (angular.negative?.indices.length ?? 0) / 3,
        },
      },
    };
  }

  let nodalSheets: MeshArrays | null = null;
  if (spec.look.showNodalSurfaces) {
    if (single)
      nodalSheets = buildNodalSheets(
        angularNodes(single.l, single.m, single.basis),
        geometry.radius * 1.08,
      );
    else
      notes.push(
        'Nodal surfaces are drawn for single orbitals only: those of a superposition are not planes or cones in general.',
      );
  }
  onProgress(1, 'done');
  return { ...geometry, nodalSheets, notes, facts: { ...geometry.facts, ms: now() - started } };
}

const emptyFacts = {
  enclosed: null,
  densityLevel: null,
  psiLevel: null,
  gridTotal: null,
  grid: null,
  clippedByGrid: false,
  outer: null,
  triangles: { positive: 0, negative: 0, phase: 0, outer: 0, total: 0 },
  points: null,
  acceptance: null,
  seed: null,
} as const;

/** The one orbital of a state with one term in the real basis or one in the complex basis. */
function singleOrbital(
  state: CompiledState,
): { n: number; l: number; m: number; basis: 'real' | 'complex' } | null {
  if (state.realTerms.length === 1) {
    const t = state.realTerms[0];
    return { n: t.n, l: t.l, m: t.m, basis: 'real' };
  }
  if (state.terms.length === 1) {
    const t = state.terms[0];
    return { n: t.n, l: t.l, m: t.m, basis: 'complex' };
  }
  return null;
}

function toThree(mesh: TriangleMesh | null): MeshArrays | null {
  if (!mesh || mesh.triangleCount === 0) return null;
  return {
    positions: physicsTriplesToThree(mesh.positions),
    normals: physicsTriplesToThree(mesh.normals),
    indices: mesh.indices,
    phases: mesh.phases,
  };
}

function surfaceSet(surface: Isosurface): SurfaceSet {
  return {
    positive: toThree(surface.positive),
    negative: toThree(surface.negative),
    phase: toThree(surface.magnitude),
  };
}

function totalTriangles(surface: Isosurface): number {
  return surface.triangles.positive + surface.triangles.negative + surface.triangles.magnitude;
}

function meshRadius(set: SurfaceSet): number {
  let largest = 0;
  for (const mesh of [set.positive, set.negative, set.phase]) {
    if (!mesh) continue;
    const p = mesh.positions;
    for (let i = 0; i < p.length; i += 3)
      largest = Math.max(largest, p[i] * p[i] + p[i + 1] * p[i + 1] + p[i + 2] * p[i + 2]);
  }
  return Math.sqrt(largest);
}

function percent(fraction: number): string {
  return `${(100 * fraction).toFixed(1)} %`;
}
