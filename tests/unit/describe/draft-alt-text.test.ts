// Alt text drafted from the spec: every clause must be true of the computed orbital.
// Node positions and counts are textbook facts (REFERENCE.md §8: 2s node at 2 a0, 3p at 6 a0;
// d_z² cones at arccos(±1/√3) = 54.7°, 125.3° — common knowledge).
import { describe, expect, it } from 'vitest';
import { draftAltText } from '../../../shared/describe/draft-alt-text';
import { figureSpecSchema } from '../../../shared/spec/figure-spec';
import { defaultHouseStyle } from '../../../shared/spec/house-style';
import { resolveFigureSpec } from '../../../shared/spec/resolve-figure-spec';

const alt = (x: object) => draftAltText(resolveFigureSpec(figureSpecSchema.parse({ schemaVersion: 1, ...x }), defaultHouseStyle));

describe('draftAltText', () => {
  it('when the figure is a 3d_z² isosurface, then it names the enclosed fraction, both cones and three regions', () => {
    const text = alt({ state: { terms: [{ n: 3, l: 2, m: 0 }] }, kind: { type: 'isosurface', enclosed: 0.9 } });
    expect(text).toMatch(/^Isosurface enclosing 90 % of the probability of a 3d_z² orbital/);
    expect(text).toMatch(/two nodal cones about the z axis at 54\.7° and 125\.3°/);
    expect(text).toMatch(/three regions in all/);
  });

  it('when the figure is 2p_z, then it names the xy nodal plane and two regions of opposite phase', () => {
    const text = alt({ state: { terms: [{ n: 2, l: 1, m: 0 }] }, kind: { type: 'isosurface' } });
    expect(text).toMatch(/one nodal plane \(the xy-plane\)/);
    expect(text).toMatch(/two regions in all/);
  });

  it('when the figure is 4f_xyz, then it has three nodal planes and eight regions', () => {
    const text = alt({ state: { terms: [{ n: 4, l: 3, m: -2 }] }, kind: { type: 'isosurface' } });
    expect(text).toMatch(/three nodal planes/);
    expect(text).toMatch(/eight regions in all/);
  });

  it('when a radial plot shows 2s in pm, then the node (2 bohr = 105.83 pm) and most probable radius are printed', () => {
    const text = alt({
      state: { terms: [{ n: 2, l: 0, m: 0 }] },
      system: { lengthUnit: 'pm' },
      kind: { type: 'radial', curves: [{ n: 2, l: 0, quantity: 'r2R2' }] },
    });
    // 2 a0 = 105.835 pm (CODATA 2022 a0 = 52.9177210544 pm); 3 + √5 a0 = 277.08 pm
    expect(text).toMatch(/2s: nodes at 106 pm; most probable radius 277 pm/);
  });

  it('when a level diagram shows 3 → 2 for ¹H, then the Balmer wavelength is the reduced-mass one', () => {
    const text = alt({ state: { terms: [{ n: 1, l: 0, m: 0 }] }, system: { nucleus: 'H-1' }, kind: { type: 'levels', transitions: [{ upper: 3, lower: 2 }] } });
    // REFERENCE.md §3: Hα vacuum, reduced mass, 656.469 606 nm
    expect(text).toMatch(/3 → 2 \(Balmer\) at 656\.5 nm in vacuum/);
  });
});
