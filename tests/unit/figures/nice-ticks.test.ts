// Heckbert's loose labelling (Graphics Gems, 1990): worked examples checked by hand.
import { describe, expect, it } from 'vitest';
import { niceNumber, niceTicks, snugTicks } from '../../../shared/figures/nice-ticks';
import { formatFixed, formatSignificant } from '../../../shared/figures/number-format';

describe('nice ticks and number formatting', () => {
  it('when rounding, then nice numbers are 1, 2, 5 or 10 times a power of ten', () => {
    expect(niceNumber(0.137, true)).toBeCloseTo(0.1, 15);
    expect(niceNumber(27, true)).toBe(20);
    expect(niceNumber(27, false)).toBe(50);
    expect(niceNumber(4.2, true)).toBe(5);
  });

  it('when labelling 0 … 14.3 with about 5 ticks, then the axis runs 0, 5, 10, 15', () => {
    const t = niceTicks(0, 14.3, 5);
    expect(t.values).toEqual([0, 5, 10, 15]);
    expect(t.decimals).toBe(0);
  });

  it('when labelling −0.13 … 0.42, then ticks are exact decimals with one digit', () => {
    // By hand: range = nice(0.55, ceiling) = 1, step = nice(1/4, rounded) = 0.2, ends floor/ceil to the step.
    const t = niceTicks(-0.13, 0.42, 5);
    expect(t.values).toEqual([-0.2, 0, 0.2, 0.4, 0.6]);
    expect(t.decimals).toBe(1);
  });

  it('when choosing among tick counts, then the axis wastes the least span', () => {
    // 0 … 0.203: five ticks overshoot to 0.3; the snug choice ends at 0.25.
    expect(niceTicks(0, 0.203, 5).max).toBeCloseTo(0.3, 15);
    expect(snugTicks(0, 0.203).max).toBeCloseTo(0.25, 15);
  });

  it('when printing numbers, then the minus sign is U+2212 and negative zero is plain zero', () => {
    expect(formatFixed(-0.5, 1)).toBe('\u22120.5');
    expect(formatFixed(-0.00001, 2)).toBe('0.00');
    expect(formatSignificant(4, 3)).toBe('4.00');
    expect(formatSignificant(211.6708, 3)).toBe('212');
    expect(formatSignificant(656.4696, 6)).toBe('656.470');
    expect(formatSignificant(9.996, 3)).toBe('10.0');
    expect(formatSignificant(-115_046, 3)).toBe('\u22121.15 × 10⁵');
    expect(formatSignificant(0.000012345, 3)).toBe('1.23 × 10⁻⁵');
    expect(formatSignificant(99_999, 3)).toBe('1.00 × 10⁵');
  });
});
