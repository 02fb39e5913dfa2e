// Small composer helpers: what a newer revision changed, ids of inline SVG kept apart, orbital
// names as plain text for drop-down lists (names as in shared/physics/orbital-labels.ts).
import { describe, expect, it } from 'vitest';
import { figureSpecSchema } from '../../../shared/spec/figure-spec';
import { orbitalLabel } from '../../../shared/physics/orbital-labels';
import { specChanges } from '../../../app/features/composer/utils/spec-diff';
import { scopeSvgIds } from '../../../app/features/composer/utils/scope-svg-ids';
import { orbitalPlainText } from '../../../app/features/composer/utils/orbital-text';
import { isThreeDimensional } from '../../../app/features/composer/utils/figure-dimensions';

const spec = figureSpecSchema.parse({
  schemaVersion: 1,
  state: { terms: [{ n: 3, l: 2, m: 0 }] },
  kind: { type: 'isosurface' },
});

describe('composer helpers', () => {
  it('when a newer revision changed n and set a colour, then both leaves are named with old and new values', () => {
    const newer = {
      ...spec,
      state: { ...spec.state, terms: [{ ...spec.state.terms[0], n: 4 }] },
      look: { positiveColour: '#123456' },
    };
    expect(specChanges(spec, newer)).toEqual([
      { path: 'look.positiveColour', from: 'house style', to: '#123456' },
      { path: 'state.terms.0.n', from: '3', to: '4' },
    ]);
    expect(specChanges(spec, structuredClone(spec))).toEqual([]);
  });

  it('when an SVG is scoped, then its ids, url() references and labelled-by lists carry the prefix', () => {
    const svg =
      '<?xml version="1.0"?>\n<svg aria-labelledby="figure-title figure-desc"><title id="figure-title">t</title><clipPath id="c1"/><g clip-path="url(#c1)"/></svg>';
    expect(scopeSvgIds(svg, 'p-')).toBe(
      '<svg aria-labelledby="p-figure-title p-figure-desc"><title id="p-figure-title">t</title><clipPath id="p-c1"/><g clip-path="url(#p-c1)"/></svg>',
    );
  });

  it('when orbital names are written for a list, then subscripts join the letter and complex m is spelled out', () => {
    expect(orbitalPlainText(orbitalLabel(3, 2, 0, 'real'))).toBe('3dz²');
    expect(orbitalPlainText(orbitalLabel(null, 3, -2, 'real'))).toBe('fxyz');
    expect(orbitalPlainText(orbitalLabel(2, 1, 1, 'complex'))).toBe('2p (m = +1)');
    expect(orbitalPlainText(orbitalLabel(1, 0, 0, 'real'))).toBe('1s');
  });

  it('when the kind is an isosurface, cloud or angular surface, then it is 3D; slices, plots and curves are flat', () => {
    expect(isThreeDimensional({ type: 'cloud', points: 1000, seed: 1 })).toBe(true);
    expect(
      isThreeDimensional({ type: 'angular', mode: 'surface', quantity: 'real', plane: 'xz' }),
    ).toBe(true);
    expect(
      isThreeDimensional({ type: 'angular', mode: 'curve', quantity: 'real', plane: 'xz' }),
    ).toBe(false);
    expect(isThreeDimensional(spec.kind)).toBe(true);
  });
});

describe('the automatic box size', () => {
  it('when the spec leaves the extent unset, then fixing it starts from the size the builders would choose', async () => {
    const { automaticExtent } =
      await import('../../../app/features/composer/utils/automatic-extent');
    const { suggestedExtent } = await import('../../../shared/physics/sample-state-on-grid');
    const { compileState } = await import('../../../shared/physics/orbital-state');
    const { orbitalStateOf } = await import('../../../shared/figures/figure-system');
    expect(automaticExtent(spec)).toBe(suggestedExtent(compileState(orbitalStateOf(spec))));
    expect(automaticExtent(spec)).toBeGreaterThan(10);
  });
});
