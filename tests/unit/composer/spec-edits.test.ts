// The composer's edits cannot make an invalid spec: quantum numbers clamp (0 ≤ l < n, |m| ≤ l),
// the real-orbital picker offers exactly 2l + 1 names, kinds start valid, presets parse.
// Orbital names: REFERENCE.md §5 and the real-orbital table in shared/physics/orbital-labels.ts
// (common practice: p_x, p_y, p_z; d_xy, d_yz, d_z², d_xz, d_x²−y²; the seven cubic-free f names).
import { describe, expect, it } from 'vitest';
import {
  figureKindNames,
  figureSpecSchema,
  type FigureSpec,
} from '../../../shared/spec/figure-spec';
import {
  addRadialCurve,
  addTerm,
  addTransition,
  changeKind,
  clampTransition,
  makeSingle,
  orbitalChoices,
  removeTerm,
  setBasis,
  setQuantumNumber,
  setRadialCurve,
  setTransition,
  setWeight,
} from '../../../app/features/composer/utils/spec-edits';
import { FIGURE_PRESETS } from '../../../app/features/composer/utils/figure-presets';
import {
  applyHouseStyle,
  houseStyleOverrides,
} from '../../../app/features/composer/utils/house-style-overrides';
import { pixelsFor } from '../../../app/features/composer/utils/print-size';
import { defaultHouseStyle } from '../../../shared/spec/house-style';

const spec = (n: number, l: number, m: number, kind: object = { type: 'isosurface' }): FigureSpec =>
  figureSpecSchema.parse({ schemaVersion: 1, state: { terms: [{ n, l, m }] }, kind });
const term = (s: FigureSpec, i = 0) => s.state.terms[i];
const valid = (s: FigureSpec) => expect(figureSpecSchema.safeParse(s).success).toBe(true);

describe('quantum numbers in the composer', () => {
  it('when n is lowered below l, then l drops to n − 1 and m to within ±l', () => {
    const s = setQuantumNumber(spec(4, 3, -3), 0, 'n', 2);
    expect(term(s)).toMatchObject({ n: 2, l: 1, m: -1 });
    valid(s);
  });

  it('when l is lowered, then m is clamped; when l is raised past n, then it stops at n − 1', () => {
    expect(term(setQuantumNumber(spec(4, 3, 2), 0, 'l', 1))).toMatchObject({ l: 1, m: 1 });
    expect(term(setQuantumNumber(spec(4, 3, 0), 0, 'l', 9))).toMatchObject({ n: 4, l: 3 });
  });

  it('when n or m are out of the schema range, then they stop at 1…30 and −l…+l', () => {
    expect(term(setQuantumNumber(spec(2, 1, 0), 0, 'n', 99)).n).toBe(30);
    expect(term(setQuantumNumber(spec(2, 1, 0), 0, 'n', 0))).toMatchObject({ n: 1, l: 0, m: 0 });
    expect(term(setQuantumNumber(spec(3, 2, 0), 0, 'm', -7)).m).toBe(-2);
  });

  it('when any sequence of edits is made, then every spec on the way is valid', () => {
    // A fixed pseudo-random walk over the edit functions.
    let seed = 12345;
    const rand = (k: number) => {
      seed = (seed * 1103515245 + 12345) % 2 ** 31;
      return seed % k;
    };
    let s = spec(1, 0, 0);
    for (let i = 0; i < 400; i++) {
      const which = (['n', 'l', 'm'] as const)[rand(3)];
      const index = rand(s.state.terms.length);
      switch (rand(6)) {
        case 0:
          s = addTerm(s);
          break;
        case 1:
          s = removeTerm(s, index);
          break;
        case 2:
          s = setBasis(s, index, rand(2) ? 'real' : 'complex');
          break;
        case 3:
          s = setWeight(s, index, rand(2) ? 're' : 'im', rand(3) - 1);
          break;
        default:
          s = setQuantumNumber(s, index, which, rand(40) - 5);
      }
      valid(s);
    }
  });

  it('when the last non-zero weight would be set to zero, then the edit is refused', () => {
    const s = setWeight(spec(2, 1, 0), 0, 're', 0);
    expect(term(s).weight).toEqual({ re: 1, im: 0 });
  });

  it('when a superposition becomes one orbital, then its first term stays with weight 1', () => {
    const s = makeSingle(setWeight(addTerm(spec(2, 1, 0)), 0, 're', 0.5));
    expect(s.state.terms).toHaveLength(1);
    expect(term(s)).toMatchObject({ n: 2, l: 1, m: 0, weight: { re: 1, im: 0 } });
  });
});

describe('the real-orbital picker', () => {
  it.each([0, 1, 2, 3, 4, 7])(
    'when l = %i, then it offers exactly 2l + 1 distinct orbitals',
    (l) => {
      const choices = orbitalChoices(l, 'real');
      expect(choices).toHaveLength(2 * l + 1);
      expect(new Set(choices.map((c) => c.label.text)).size).toBe(2 * l + 1);
      expect(new Set(choices.map((c) => c.m)).size).toBe(2 * l + 1);
    },
  );

  it('when l = 1, 2, 3, then the names are the conventional ones (common practice)', () => {
    const names = (l: number) =>
      orbitalChoices(l, 'real')
        .map((c) => c.label.text)
        .sort();
    expect(names(1)).toEqual(['p_x', 'p_y', 'p_z']);
    expect(names(2)).toEqual(['d_x²−y²', 'd_xy', 'd_xz', 'd_yz', 'd_z²'].sort());
    expect(names(3)).toEqual(
      ['f_xyz', 'f_xz²', 'f_x(x²−3y²)', 'f_y(3x²−y²)', 'f_yz²', 'f_z³', 'f_z(x²−y²)'].sort(),
    );
    expect(orbitalChoices(2, 'real').find((c) => c.label.text === 'd_z²')?.m).toBe(0);
  });
});

describe('figure kinds, curves and transitions', () => {
  it.each(figureKindNames)('when the kind becomes %s, then the spec is valid', (kind) => {
    valid(changeKind(spec(3, 2, 1), kind));
  });

  it('when the kind becomes a radial plot, then it draws r²R² of each shell in the state', () => {
    const s = changeKind(addTerm(spec(2, 1, 0)), 'radial');
    expect(s.kind).toMatchObject({
      type: 'radial',
      curves: [
        { n: 2, l: 1, quantity: 'r2R2' },
        { n: 2, l: 0 },
      ],
    });
  });

  it('when a radial curve gets n below its l, then l follows', () => {
    const s = setRadialCurve(addRadialCurve(changeKind(spec(4, 3, 0), 'radial')), 0, { n: 2 });
    expect(s.kind.type === 'radial' && s.kind.curves[0]).toMatchObject({ n: 2, l: 1 });
    valid(s);
  });

  it('when a transition end moves past the other, then the other follows (upper > lower)', () => {
    expect(clampTransition({ upper: 3, lower: 5 }, 'lower')).toEqual({ upper: 6, lower: 5 });
    expect(clampTransition({ upper: 2, lower: 4 }, 'upper')).toEqual({ upper: 2, lower: 1 });
    const s = setTransition(addTransition(changeKind(spec(1, 0, 0), 'levels')), 0, 'lower', 9);
    expect(s.kind.type === 'levels' && s.kind.transitions[0]).toEqual({ upper: 10, lower: 9 });
    valid(s);
  });

  it.each(FIGURE_PRESETS.map((p) => [p.name, p] as const))(
    'preset "%s" gives a valid spec',
    (_, p) => {
      const s = p.apply(spec(1, 0, 0));
      valid(s);
    },
  );
});

describe('house style and print size', () => {
  it('when a figure sets its own colour and width, then both are listed and applying the house style clears them', () => {
    const s: FigureSpec = {
      ...spec(2, 1, 0),
      look: { positiveColour: '#112233' },
      print: { widthMm: 174 },
    };
    const list = houseStyleOverrides(s, defaultHouseStyle);
    expect(list.map((o) => o.field)).toEqual(['positiveColour', 'widthMm']);
    expect(list[1]).toMatchObject({ figureValue: '174 mm', houseValue: '84 mm' });
    expect(houseStyleOverrides(applyHouseStyle(s), defaultHouseStyle)).toEqual([]);
  });

  it('when 84 mm is printed at 600 dpi, then it is round(84 / 25.4 × 600) = 1984 px (as DESIGN.md)', () => {
    expect(pixelsFor(84, 600)).toBe(1984);
    expect(pixelsFor(84, 300)).toBe(992);
  });
});

describe('the read-out of the state', () => {
  it('when the state is hydrogen 2p (infinite nucleus), then E = −1/8 hartree, ⟨r⟩ = 5 bohr, r_mp = 4 bohr, nodes 0 / 1', async () => {
    // E_n = −Z²/(2n²) hartree; ⟨r⟩ = [3n² − l(l+1)]/(2Z) a₀; r_mp = n²/Z for l = n − 1 (REFERENCE.md §4, §8; textbook).
    const { stateFacts } = await import('../../../app/features/composer/utils/state-facts');
    const f = stateFacts(spec(2, 1, 0));
    expect(f.terms[0]).toMatchObject({ radialNodes: 0, angularNodes: 1, share: 1 });
    expect(f.terms[0].energyHartree).toBeCloseTo(-0.125, 14);
    expect(f.terms[0].meanRadius).toBeCloseTo(5, 12);
    expect(f.terms[0].mostProbableRadius).toBeCloseTo(4, 9);
    expect(f.mixesEnergies).toBe(false);
  });

  it('when 1s and 2p_z have equal weights, then each has half the probability and the state mixes energies', async () => {
    const { stateFacts } = await import('../../../app/features/composer/utils/state-facts');
    const s = setQuantumNumber(addTerm(spec(1, 0, 0)), 1, 'l', 1);
    const f = stateFacts(s);
    expect(f.terms.map((t) => t.share)).toEqual([0.5, 0.5]);
    expect(f.mixesEnergies).toBe(true);
    expect(f.meanEnergyEv).toBeCloseTo((f.terms[0].energyEv + f.terms[1].energyEv) / 2, 12);
  });
});
