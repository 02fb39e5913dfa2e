// What the 3D figure needs from the computation: meshes, points, nodal sheets, facts and notes.
import type { MeshArrays } from './mesh-arrays';

export type OrbitalViewKind = 'isosurface' | 'cloud' | 'angular';

/** Numbers the figure shows or is built on, all computed (none typed in). */
export interface OrbitalFacts {
  readonly kind: OrbitalViewKind;
  /** Conventional name of a single orbital ("2p_z"), or a description of the superposition. */
  readonly label: string;
  readonly isReal: boolean;
  /** Fraction of the probability inside the surface: asked for, and as summed on the grid. */
  readonly enclosed: { readonly requested: number; readonly achieved: number } | null;
  /** |ψ|² on the surface (bohr⁻³) and |ψ| (bohr^(−3/2)). */
  readonly densityLevel: number | null;
  readonly psiLevel: number | null;
  /** Probability the computed cube holds (below 1 when the extent truncates the orbital). */
  readonly gridTotal: number | null;
  readonly grid: { readonly pointsPerAxis: number; readonly halfWidthBohr: number } | null;
  readonly clippedByGrid: boolean;
  readonly outer: {
    readonly requested: number;
    readonly achieved: number;
    readonly densityLevel: number;
  } | null;
  readonly triangles: {
    readonly positive: number;
    readonly negative: number;
    readonly phase: number;
    readonly outer: number;
    readonly total: number;
  };
  readonly points: number | null;
  /** Accepted over drawn candidates (cloud). */
  readonly acceptance: number | null;
  readonly seed: number | null;
  /** Radial and angular node counts of a single orbital; null for a superposition. */
  readonly nodes: { readonly radial: number; readonly angular: number } | null;
  /** Wall-clock milliseconds spent computing. */
  readonly ms: number;
}

export interface SurfaceSet {
  /** ψ = +c (real states), or the Re F ≥ 0 part of an angular surface. */
  readonly positive: MeshArrays | null;
  readonly negative: MeshArrays | null;
  /** |ψ| = c of a complex state, with arg ψ per vertex. */
  readonly phase: MeshArrays | null;
}

export interface CloudPoints {
  /** x, y, z per point, bohr, three.js frame. */
  readonly positions: Float32Array;
  /** arg ψ per point: 0 or π for a real state. */
  readonly phases: Float32Array;
  readonly count: number;
}

export interface OrbitalGeometry {
  readonly kind: OrbitalViewKind;
  /** Radius about the nucleus that holds what is drawn: bohr, or the dimensionless |Y| of an angular plot. */
  readonly radius: number;
  /** False for angular plots, whose size is not a length (no scale bar). */
  readonly hasLength: boolean;
  readonly surfaces: SurfaceSet | null;
  /** Translucent outer surface at another enclosed fraction. */
  readonly outer: SurfaceSet | null;
  readonly cloud: CloudPoints | null;
  readonly nodalSheets: MeshArrays | null;
  readonly facts: OrbitalFacts;
  /** Plain-language warnings where the figure could mislead. */
  readonly notes: readonly string[];
}
