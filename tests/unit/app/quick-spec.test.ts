// The "new figure" choices: only valid hydrogen-like states can be picked, and each kind's spec
// built from them is accepted by the shared figure-spec schema and the create-figure request.
import { describe, expect, it } from 'vitest';
import {
  buildQuickSpec,
  clampQuickState,
  lChoices,
  mChoices,
  nChoices,
} from '../../../app/features/figures/utils/quick-spec';
import { createFigureBody } from '../../../shared/api/schemas';
import { figureKindNames, figureSpecSchema, MAX_N } from '../../../shared/spec/figure-spec';

describe('quick state choices', () => {
  it('when the pickers are enumerated for each n, then they offer n² states (degeneracy of a hydrogen-like level; common practice)', () => {
    for (const n of nChoices()) {
      const count = lChoices(n).reduce((sum, l) => sum + mChoices(l).length, 0);
      expect(count, `n = ${n}`).toBe(n * n);
    }
    expect(nChoices()).toEqual(Array.from({ length: MAX_N }, (_, i) => i + 1));
  });

  it('when n is 1, then l = 0 and m = 0 are the only choices', () => {
    expect(lChoices(1)).toEqual([0]);
    expect(mChoices(0)).toEqual([0]);
  });

  it('when n drops below l, then l and m are pulled back into range', () => {
    expect(clampQuickState({ n: 2, l: 3, m: -3 })).toEqual({ n: 2, l: 1, m: -1 });
    expect(clampQuickState({ n: 0, l: 5, m: 5 })).toEqual({ n: 1, l: 0, m: 0 });
    expect(clampQuickState({ n: 99, l: 40, m: 40 })).toEqual({
      n: MAX_N,
      l: MAX_N - 1,
      m: MAX_N - 1,
    });
  });
});

describe('quick spec', () => {
  it('when every kind is built for every offered state up to n = 6 and at n = 30, then the schema accepts it', () => {
    const ns = [1, 2, 3, 4, 5, 6, MAX_N];
    for (const kind of figureKindNames) {
      for (const n of ns) {
        for (const l of lChoices(n)) {
          for (const m of mChoices(l)) {
            const spec = buildQuickSpec(kind, { n, l, m });
            const parsed = figureSpecSchema.safeParse(spec);
            expect(parsed.success, `${kind} n=${n} l=${l} m=${m}: ${parsed.error?.message}`).toBe(
              true,
            );
            expect(spec.kind.type).toBe(kind);
            expect(spec.state.terms).toEqual([
              { n, l, m, basis: 'real', weight: { re: 1, im: 0 } },
            ]);
          }
        }
      }
    }
  });

  it('when a figure is created from a quick spec, then the create-figure request accepts it unchanged', () => {
    const spec = buildQuickSpec('slice', { n: 3, l: 2, m: 1 });
    const body = createFigureBody.parse({ title: '3d_xz', number: '1.1', spec });
    expect(body.spec).toEqual(spec);
  });

  it('when a radial plot is built, then it draws the radial distribution of the chosen n and l', () => {
    const spec = buildQuickSpec('radial', { n: 4, l: 2, m: -1 });
    expect(spec.kind).toMatchObject({ type: 'radial', curves: [{ n: 4, l: 2, quantity: 'r2R2' }] });
  });

  it('when a level diagram is built for n above 6, then it reaches that n, up to the schema limit of 12', () => {
    expect(buildQuickSpec('levels', { n: 2, l: 0, m: 0 }).kind).toMatchObject({ nMax: 6 });
    expect(buildQuickSpec('levels', { n: 9, l: 0, m: 0 }).kind).toMatchObject({ nMax: 9 });
    expect(buildQuickSpec('levels', { n: 20, l: 0, m: 0 }).kind).toMatchObject({ nMax: 12 });
  });
});
