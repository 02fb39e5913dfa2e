// Lobewright figure specification, schema version 1: what is computed, how it is drawn, how it is printed.
// The stored spec may leave `look` and `print` fields unset; the project's house style fills them
// (see resolve-figure-spec.ts). Documented in README.md ("Figure specification").
import { z } from 'zod';
import { coreScreenedCoulombSchema } from '../solver/potentials/core-screened-coulomb';
import { coulombSchema } from '../solver/potentials/coulomb';
import { finiteNucleusSchema } from '../solver/potentials/finite-nucleus';
import { finiteWellSchema } from '../solver/potentials/finite-well';
import { harmonicOscillatorSchema } from '../solver/potentials/harmonic-oscillator';
import { hulthenSchema } from '../solver/potentials/hulthen';
import { infiniteWellSchema } from '../solver/potentials/infinite-well';
import { linearSchema } from '../solver/potentials/linear';
import { tabulatedSchema } from '../solver/potentials/tabulated';
import { valenceGszSchema } from '../solver/potentials/valence-gsz';
import { yukawaSchema } from '../solver/potentials/yukawa';

export const FIGURE_SPEC_VERSION = 1;
export const MAX_N = 30;
export const MAX_Z = 92;
/** Most angular momenta one effective-potential figure draws, and the largest l it accepts. */
export const MAX_POTENTIAL_LS = 6;
export const MAX_POTENTIAL_L = 12;
/** Most solved levels per l a figure draws. */
export const MAX_SOLVED_LEVELS = 10;
/** Tabulated potentials are kept in the spec itself; their CSV text stays below this many characters. */
export const MAX_SPEC_CSV_CHARS = 200_000;
/** Uploaded data sets one radial figure may draw. */
export const MAX_FIGURE_DATASETS = 6;

const hexColour = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'use a colour such as #1f6feb');
const finite = z.number().finite();

export const complexWeightSchema = z.object({ re: finite, im: finite });

export const termSchema = z
  .object({
    n: z.number().int().min(1).max(MAX_N),
    l: z.number().int().min(0).max(MAX_N - 1),
    m: z.number().int().min(-(MAX_N - 1)).max(MAX_N - 1),
    basis: z.enum(['real', 'complex']).default('real'),
    weight: complexWeightSchema.default({ re: 1, im: 0 }),
  })
  .superRefine((t, ctx) => {
    if (t.l >= t.n) ctx.addIssue({ code: 'custom', path: ['l'], message: `l must be less than n (${t.n})` });
    if (Math.abs(t.m) > t.l)
      ctx.addIssue({ code: 'custom', path: ['m'], message: `|m| must not exceed l (${t.l})` });
  });
export type SpecTerm = z.infer<typeof termSchema>;

/**
 * A central potential for the radial solver (shared/solver), exactly the JSON buildPotential accepts:
 * atomic units throughout, each parameter's unit named in its error message. coulomb { Z };
 * yukawa { Z, lambda (bohr⁻¹) }; finite-nucleus { Z, radius (bohr) }; harmonic-oscillator
 * { omega (hartree/ħ) }; finite-well { depth (hartree), radius (bohr) }; infinite-well { radius (bohr) };
 * linear { F (hartree/bohr) }; hulthen { Z, delta (bohr⁻¹) }; core-screened { Z, a (bohr) };
 * valence-gsz { Z, electrons, H, d (bohr) }; tabulated { csv (r, V columns), asymptoticCharge? }.
 */
export const potentialSpecSchema = z
  .discriminatedUnion('type', [
    coulombSchema,
    yukawaSchema,
    finiteNucleusSchema,
    harmonicOscillatorSchema,
    finiteWellSchema,
    infiniteWellSchema,
    linearSchema,
    hulthenSchema,
    coreScreenedCoulombSchema,
    valenceGszSchema,
    tabulatedSchema.extend({
      csv: z
        .string({ error: 'csv must be CSV text' })
        .max(MAX_SPEC_CSV_CHARS, `csv must be at most ${MAX_SPEC_CSV_CHARS} characters in a figure spec`),
    }),
  ])
  .describe('Central potential V(r) for the radial solver, in hartree with r in bohr');
export type PotentialSpec = z.infer<typeof potentialSpecSchema>;
export const DEFAULT_POTENTIAL: PotentialSpec = { type: 'yukawa', Z: 1, lambda: 0.1 };

export const nucleusSchema = z.union([
  z.enum(['infinite', 'H-1', 'H-2', 'He-4']),
  z.object({ massInElectronMasses: z.number().finite().min(1).max(1e7) }),
]);

export const systemSchema = z.object({
  Z: z.number().int().min(1).max(MAX_Z).default(1),
  nucleus: nucleusSchema.default('infinite'),
  lengthUnit: z.enum(['bohr', 'pm', 'angstrom']).default('bohr'),
});

export const stateSchema = z
  .object({
    terms: z.array(termSchema).min(1).max(16),
    /** Time in atomic units (ħ/E_h); each term's phase advances as e^(−iE_n t). */
    time: finite.min(0).default(0),
  })
  .superRefine((s, ctx) => {
    if (s.terms.every((t) => t.weight.re === 0 && t.weight.im === 0))
      ctx.addIssue({ code: 'custom', path: ['terms'], message: 'at least one weight must be non-zero' });
  });

const planeSchema = z.union([
  z.enum(['xy', 'xz', 'yz']),
  z.object({ normal: z.tuple([finite, finite, finite]) }).refine((p) => Math.hypot(...p.normal) > 0, {
    message: 'normal must not be zero',
    path: ['normal'],
  }),
]);

const fraction = z.number().gt(0).lt(1);

export const isosurfaceKindSchema = z.object({
  type: z.literal('isosurface'),
  enclosed: z.number().min(0.05).max(0.999).default(0.9),
  grid: z.number().int().min(24).max(256).default(96),
  extent: z.number().positive().max(2000).optional(),
  outerSurface: z.object({ enclosed: fraction, opacity: z.number().min(0).max(1) }).nullable().default(null),
});
export const sliceKindSchema = z.object({
  type: z.literal('slice'),
  plane: planeSchema.default('xz'),
  quantity: z.enum(['psi', 'density']).default('psi'),
  contours: z
    .union([
      z.object({ mode: z.literal('enclosed'), fractions: z.array(fraction).max(12) }),
      z.object({ mode: z.literal('levels'), levels: z.array(finite).max(24) }),
    ])
    .default({ mode: 'enclosed', fractions: [0.5, 0.9] }),
  extent: z.number().positive().max(2000).optional(),
  resolution: z.number().int().min(32).max(1024).default(256),
});
export const radialCurveSchema = z.object({
  n: z.number().int().min(1).max(MAX_N),
  l: z.number().int().min(0).max(MAX_N - 1),
  quantity: z.enum(['R', 'r2R2', 'cumulative', 'veff']),
  /** "solved": the numerical solution in kind.potential, drawn beside hydrogen's (unset: hydrogen). */
  source: z.enum(['hydrogen', 'solved']).optional(),
});
export const radialKindSchema = z.object({
  type: z.literal('radial'),
  curves: z.array(radialCurveSchema).min(1).max(12),
  rMax: z.number().positive().max(5000).optional(),
  showNodes: z.boolean().default(true),
  showMostProbable: z.boolean().default(true),
  /**
   * Uploaded data sets of the figure's project drawn beside the computed curves, each in the panel
   * of its quantity. Optional, so specs without it keep their schema version and their hash.
   */
  datasets: z
    .array(z.object({ id: z.number().int().positive(), label: z.string().trim().max(80).optional() }))
    .max(MAX_FIGURE_DATASETS)
    .refine((d) => new Set(d.map((x) => x.id)).size === d.length, 'list each dataset once')
    .optional(),
  /** The potential solved for curves with source "solved". */
  potential: potentialSpecSchema.optional(),
}).superRefine((k, ctx) => {
  const solved = k.curves.findIndex((c) => c.source === 'solved');
  if (solved >= 0 && k.potential === undefined)
    ctx.addIssue({ code: 'custom', path: ['potential'], message: `curves[${solved}] is solved numerically: give the potential` });
});
export const cloudKindSchema = z.object({
  type: z.literal('cloud'),
  points: z.number().int().min(1000).max(200_000).default(20_000),
  seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
});
export const angularKindSchema = z.object({
  type: z.literal('angular'),
  mode: z.enum(['surface', 'curve']).default('surface'),
  quantity: z.enum(['abs', 'real']).default('real'),
  plane: planeSchema.default('xz'),
});
export const levelsKindSchema = z.object({
  type: z.literal('levels'),
  nMax: z.number().int().min(2).max(12).default(6),
  transitions: z
    .array(z.object({ upper: z.number().int().min(2).max(40), lower: z.number().int().min(1).max(39) }))
    .max(24)
    .default([]),
  /** "solved-vs-hydrogen": kind.potential's levels for l = 0 … lMax beside hydrogen's. */
  compare: z.enum(['solved-vs-hydrogen']).optional(),
  potential: potentialSpecSchema.optional(),
  lMax: z.number().int().min(0).max(MAX_POTENTIAL_LS - 1).optional(),
}).superRefine((k, ctx) => {
  if (k.compare !== undefined && k.potential === undefined)
    ctx.addIssue({ code: 'custom', path: ['potential'], message: 'a comparison with solved levels needs the potential' });
});
/**
 * Effective-potential figure: V(r), the centrifugal term l(l+1)/(2μr²) and V_eff for each l, with the
 * lowest solved levels as lines between their classical turning points. rMax is in bohr.
 */
export const potentialKindSchema = z.object({
  type: z.literal('potential'),
  potential: potentialSpecSchema.default(DEFAULT_POTENTIAL),
  l: z
    .array(z.number().int().min(0).max(MAX_POTENTIAL_L))
    .min(1)
    .max(MAX_POTENTIAL_LS)
    .refine((ls) => new Set(ls).size === ls.length, 'list each l once')
    .default([0, 1, 2]),
  levels: z.number().int().min(1).max(MAX_SOLVED_LEVELS).default(2),
  rMax: z.number().positive().max(5000).optional(),
  showCentrifugal: z.boolean().default(true),
  /** Hydrogen's levels (charge of the potential's Coulomb tail or nucleus) as dashed lines. */
  compareHydrogen: z.boolean().default(false),
});

export const figureKindSchema = z.discriminatedUnion('type', [
  isosurfaceKindSchema,
  sliceKindSchema,
  radialKindSchema,
  cloudKindSchema,
  angularKindSchema,
  levelsKindSchema,
  potentialKindSchema,
]);
export type FigureKind = z.infer<typeof figureKindSchema>;
export const figureKindNames = [
  'isosurface',
  'slice',
  'radial',
  'cloud',
  'angular',
  'levels',
  'potential',
] as const;

export const viewSchema = z.object({
  azimuthDeg: z.number().min(-360).max(360).default(35),
  elevationDeg: z.number().min(-90).max(90).default(20),
  projection: z.enum(['orthographic', 'perspective']).default('orthographic'),
  zoom: z.number().min(0.1).max(10).default(1),
  lighting: z.enum(['soft', 'bright', 'flat']).default('soft'),
});

/** Drawing choices; unset fields come from the project's house style. */
export const lookSchema = z.object({
  positiveColour: hexColour.optional(),
  negativeColour: hexColour.optional(),
  opacity: z.number().min(0.05).max(1).optional(),
  showAxes: z.boolean().optional(),
  showScaleBar: z.boolean().optional(),
  showNodalSurfaces: z.boolean().optional(),
  showLabel: z.boolean().optional(),
  /** Overrides the conventional orbital name as the figure's label. */
  label: z.string().max(80).optional(),
  fontFamily: z.string().max(80).optional(),
  fontSizePt: z.number().min(5).max(24).optional(),
  lineWidthPt: z.number().min(0.1).max(4).optional(),
});

/** Print settings; unset fields come from the project's house style. */
export const printSchema = z.object({
  widthMm: z.number().min(10).max(500).optional(),
  heightMm: z.number().min(10).max(500).optional(),
  dpi: z.number().int().min(72).max(1200).optional(),
  background: z.enum(['transparent', 'white']).optional(),
  formats: z.array(z.enum(['png', 'tiff', 'pdf', 'svg'])).min(1).max(4).optional(),
});

export const figureSpecSchema = z.object({
  schemaVersion: z.literal(FIGURE_SPEC_VERSION),
  system: systemSchema.default({ Z: 1, nucleus: 'infinite', lengthUnit: 'bohr' }),
  state: stateSchema,
  kind: figureKindSchema,
  view: viewSchema.default(viewSchema.parse({})),
  look: lookSchema.default({}),
  print: printSchema.default({}),
});
export type FigureSpec = z.infer<typeof figureSpecSchema>;
export type FigureSpecInput = z.input<typeof figureSpecSchema>;
