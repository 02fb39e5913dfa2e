// The box half-width (bohr) the figure builders choose for a state when the spec leaves it unset,
// so fixing the size starts from what was already on screen.
import { orbitalStateOf } from '../../../../shared/figures/figure-system';
import { compileState } from '../../../../shared/physics/orbital-state';
import { suggestedExtent } from '../../../../shared/physics/sample-state-on-grid';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';

const FALLBACK_BOHR = 20;

export function automaticExtent(spec: Pick<FigureSpec, 'system' | 'state'>): number {
  try {
    return suggestedExtent(compileState(orbitalStateOf(spec)));
  } catch {
    return FALLBACK_BOHR;
  }
}
