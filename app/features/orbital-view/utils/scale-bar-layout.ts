/**
 * The scale bar of a 3D figure in screen pixels: a round length (1, 2 or 5 × 10^k in the figure's
 * length unit) near a fifth of the picture's width, in the lower left corner. Shared by the drawn
 * bar and by the print projection that places its vector label.
 */
import { PM_PER_BOHR, ANGSTROM_PER_BOHR } from '../../../../shared/physics/units';

export type LengthUnit = 'bohr' | 'pm' | 'angstrom';

export interface ScaleBarLayout {
  /** Length in the display unit and in bohr. */
  readonly length: number;
  readonly lengthBohr: number;
  readonly unit: LengthUnit;
  readonly label: string;
  /** Ends of the bar, pixels from the top left corner. */
  readonly from: readonly [number, number];
  readonly to: readonly [number, number];
}

const UNIT_PER_BOHR: Record<LengthUnit, number> = {
  bohr: 1,
  pm: PM_PER_BOHR,
  angstrom: ANGSTROM_PER_BOHR,
};
const UNIT_SYMBOL: Record<LengthUnit, string> = { bohr: 'bohr', pm: 'pm', angstrom: 'Å' };
/** Target bar length as a fraction of the picture's width. */
const TARGET_FRACTION = 0.2;
/** Distance of the bar from the left and bottom edges, fraction of the shorter side. */
const INSET = 0.07;

export function scaleBarLayout(
  pixelsPerBohr: number,
  widthPx: number,
  heightPx: number,
  unit: LengthUnit,
): ScaleBarLayout {
  const pixelsPerUnit = pixelsPerBohr / UNIT_PER_BOHR[unit];
  const target = (TARGET_FRACTION * widthPx) / pixelsPerUnit;
  const decade = 10 ** Math.floor(Math.log10(target));
  const length = [5, 2, 1].map((m) => m * decade).find((v) => v <= target) ?? decade;
  const inset = INSET * Math.min(widthPx, heightPx);
  const y = heightPx - inset;
  const digits = Math.max(0, -Math.floor(Math.log10(length)));
  return {
    length,
    lengthBohr: length / UNIT_PER_BOHR[unit],
    unit,
    label: `${length.toFixed(digits)} ${UNIT_SYMBOL[unit]}`,
    from: [inset, y],
    to: [inset + length * pixelsPerUnit, y],
  };
}
