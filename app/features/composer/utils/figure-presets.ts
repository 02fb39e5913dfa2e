// Starting points for common figures. A preset replaces what is computed and how it is framed
// (state, kind, view) and keeps the system, look and print settings the user already chose.
import {
  figureKindSchema,
  stateSchema,
  viewSchema,
  type FigureSpec,
} from '../../../../shared/spec/figure-spec';

export interface FigurePreset {
  id: string;
  name: string;
  apply: (spec: FigureSpec) => FigureSpec;
}

type Term = [n: number, l: number, m: number];

function preset(
  id: string,
  name: string,
  terms: Term[],
  kind: Record<string, unknown>,
  view: Record<string, unknown> = {},
): FigurePreset {
  const state = stateSchema.parse({
    terms: terms.map(([n, l, m]) => ({ n, l, m, basis: 'real', weight: { re: 1, im: 0 } })),
  });
  const parsedKind = figureKindSchema.parse(kind);
  const parsedView = viewSchema.parse(view);
  return { id, name, apply: (spec) => ({ ...spec, state, kind: parsedKind, view: parsedView }) };
}

export const FIGURE_PRESETS: readonly FigurePreset[] = [
  preset('1s-isosurface', '1s isosurface, 90 %', [[1, 0, 0]], {
    type: 'isosurface',
    enclosed: 0.9,
  }),
  preset('2pz-isosurface', '2p_z isosurface, 90 %', [[2, 1, 0]], {
    type: 'isosurface',
    enclosed: 0.9,
  }),
  preset('3dz2-isosurface', '3d_z² isosurface with nodal cones', [[3, 2, 0]], {
    type: 'isosurface',
    enclosed: 0.9,
  }),
  preset('3pz-slice', '3p_z slice (xz-plane) with contours', [[3, 1, 0]], {
    type: 'slice',
    plane: 'xz',
  }),
  preset('s-radial', '1s, 2s, 3s radial distributions', [[1, 0, 0]], {
    type: 'radial',
    curves: [1, 2, 3].map((n) => ({ n, l: 0, quantity: 'r2R2' })),
  }),
  preset('3-shell-radial', 'n = 3 radial distributions (3s, 3p, 3d)', [[3, 2, 0]], {
    type: 'radial',
    curves: [0, 1, 2].map((l) => ({ n: 3, l, quantity: 'r2R2' })),
  }),
  preset('veff', 'Effective potential, l = 0, 1, 2', [[3, 0, 0]], {
    type: 'radial',
    curves: [0, 1, 2].map((l) => ({ n: 3, l, quantity: 'veff' })),
  }),
  preset('1s-cloud', '1s probability cloud', [[1, 0, 0]], { type: 'cloud', points: 20_000 }),
  preset('dz2-angular', 'Angular shape of d_z² (curve in the xz-plane)', [[3, 2, 0]], {
    type: 'angular',
    mode: 'curve',
    plane: 'xz',
  }),
  preset('balmer', 'Balmer series levels (Hα to Hδ)', [[1, 0, 0]], {
    type: 'levels',
    nMax: 6,
    transitions: [3, 4, 5, 6].map((upper) => ({ upper, lower: 2 })),
  }),
];
