// Plain names and one-line descriptions of the figure kinds, as the interface shows them.
import type { figureKindNames } from '../../../../shared/spec/figure-spec';

export type FigureKindName = (typeof figureKindNames)[number];

export const figureKindInfo: Record<FigureKindName, { name: string; description: string }> = {
  isosurface: {
    name: '3D isosurface',
    description: 'A surface enclosing a chosen share of the probability, both phases coloured.',
  },
  slice: {
    name: '2D slice',
    description: 'The wavefunction or density on a plane through the nucleus, with contour lines.',
  },
  radial: {
    name: 'Radial plot',
    description: 'R(r), the radial distribution r²R², cumulative probability or V_eff against r.',
  },
  cloud: {
    name: 'Probability cloud',
    description: 'Points drawn at random from the probability density.',
  },
  angular: {
    name: 'Angular plot',
    description: 'The angular part alone, as a surface or as a polar curve.',
  },
  levels: {
    name: 'Energy-level diagram',
    description: 'Energy levels up to a chosen n, with transitions between them.',
  },
  potential: {
    name: 'Effective potential',
    description: 'A central potential, its centrifugal terms and V_eff for several l, with the solved levels.',
  },
};

/** The server reports a figure's kind as a string; an unknown one is shown as it comes. */
export function kindName(kind: string): string {
  return kind in figureKindInfo ? figureKindInfo[kind as FigureKindName].name : kind;
}
