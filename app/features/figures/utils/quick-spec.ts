// Builds a complete, valid figure spec from the few choices of the "new figure" dialog:
// the kind and one real orbital (n, l, m). Everything else takes the schema's defaults or,
// for look and print, the project's house style.
import {
  FIGURE_SPEC_VERSION,
  figureSpecSchema,
  MAX_N,
  type FigureSpec,
  type FigureSpecInput,
} from '../../../../shared/spec/figure-spec';
import type { FigureKindName } from './figure-kinds';

export interface QuickState {
  n: number;
  l: number;
  m: number;
}

/** Levels diagrams go up to the chosen n when it is above the default 6; the schema allows 12. */
const LEVELS_DEFAULT_N_MAX = 6;
const LEVELS_LIMIT_N_MAX = 12;

function kindInput(kind: FigureKindName, { n, l }: QuickState): FigureSpecInput['kind'] {
  switch (kind) {
    case 'radial':
      return { type: 'radial', curves: [{ n, l, quantity: 'r2R2' }] };
    case 'levels':
      return {
        type: 'levels',
        nMax: Math.min(LEVELS_LIMIT_N_MAX, Math.max(LEVELS_DEFAULT_N_MAX, n)),
      };
    default:
      return { type: kind };
  }
}

export function buildQuickSpec(kind: FigureKindName, state: QuickState): FigureSpec {
  const input: FigureSpecInput = {
    schemaVersion: FIGURE_SPEC_VERSION,
    state: {
      terms: [{ n: state.n, l: state.l, m: state.m, basis: 'real', weight: { re: 1, im: 0 } }],
    },
    kind: kindInput(kind, state),
  };
  return figureSpecSchema.parse(input);
}

/** Keeps (n, l, m) a valid state after one of them changed: 0 ≤ l < n, |m| ≤ l. */
export function clampQuickState({ n, l, m }: QuickState): QuickState {
  const nn = Math.min(MAX_N, Math.max(1, Math.trunc(n)));
  const ll = Math.min(nn - 1, Math.max(0, Math.trunc(l)));
  const mm = Math.min(ll, Math.max(-ll, Math.trunc(m)));
  return { n: nn, l: ll, m: mm };
}

function range(from: number, to: number): number[] {
  return Array.from({ length: to - from + 1 }, (_, i) => from + i);
}

/** The choices the pickers offer: n = 1…MAX_N, l = 0…n−1, m = −l…+l; nothing else can be picked. */
export const nChoices = (): number[] => range(1, MAX_N);
export const lChoices = (n: number): number[] => range(0, n - 1);
export const mChoices = (l: number): number[] => range(-l, l);
