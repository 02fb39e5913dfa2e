/**
 * Quantities and units of uploaded radial data, and their conversion to atomic units.
 *
 * A data set holds r and one of: the radial function R(r) (unit length^−3/2), the radial
 * distribution r²R²(r) (unit length^−1) or a potential V(r) (hartree or eV). Stored values are in
 * atomic units (bohr, bohr^−3/2, bohr^−1, hartree), converted once on upload with the CODATA 2022
 * constants of shared/physics/units, so drawing needs no conversion. The exponents follow from
 * the normalisation ∫R²r²dr = 1: R scales as length^−3/2 and r²R² as length^−1.
 */
import { ANGSTROM_PER_BOHR, evToHartree, PM_PER_BOHR } from '../physics/units';

export const radialDataQuantities = ['R', 'r2R2', 'potential'] as const;
export type RadialDataQuantity = (typeof radialDataQuantities)[number];

export const radialLengthUnits = ['bohr', 'pm', 'angstrom'] as const;
export type RadialLengthUnit = (typeof radialLengthUnits)[number];

/** How many of each length unit make one bohr. */
const UNITS_PER_BOHR: Record<RadialLengthUnit, number> = {
  bohr: 1,
  pm: PM_PER_BOHR,
  angstrom: ANGSTROM_PER_BOHR,
};

const LENGTH_ALIASES: Record<string, RadialLengthUnit> = {
  bohr: 'bohr',
  a0: 'bohr',
  pm: 'pm',
  angstrom: 'angstrom',
  å: 'angstrom',
  ang: 'angstrom',
};

const POWER: Record<Exclude<RadialDataQuantity, 'potential'>, string> = { R: '^-3/2', r2R2: '^-1' };

/** The value units offered for a quantity, in their written form (e.g. "pm^-3/2", "eV"). */
export function valueUnitsFor(quantity: RadialDataQuantity): string[] {
  if (quantity === 'potential') return ['hartree', 'eV'];
  return radialLengthUnits.map((u) => `${u}${POWER[quantity]}`);
}

/** Spaces, brackets and typographic minus signs do not change a unit. */
function tidy(unit: string): string {
  return unit
    .trim()
    .replace(/[\s()[\]]/g, '')
    .replace(/[\u2212\u2013]/g, '-')
    .replace(/\u207b\u00b3\u141f\u00b2/g, '^-3/2')
    .replace(/\u207b\u00b9/g, '^-1')
    .toLowerCase();
}

export function parseLengthUnit(unit: string): RadialLengthUnit | undefined {
  return LENGTH_ALIASES[tidy(unit)];
}

/** The canonical value unit ("pm^-3/2", "eV", …) for a written one, or undefined when it does not fit the quantity. */
export function parseValueUnit(quantity: RadialDataQuantity, unit: string): string | undefined {
  const t = tidy(unit);
  if (quantity === 'potential') {
    if (t === 'hartree' || t === 'eh') return 'hartree';
    if (t === 'ev') return 'eV';
    return undefined;
  }
  const power = POWER[quantity];
  const m = /^(.+?)\^?(-3\/2|-1\.5|-1)$/.exec(t);
  if (!m) return undefined;
  const length = LENGTH_ALIASES[m[1]];
  const exponent = m[2] === '-1' ? '^-1' : '^-3/2';
  return length && exponent === power ? `${length}${power}` : undefined;
}

/** Factor turning a length in `unit` into bohr. */
export function lengthToBohr(unit: RadialLengthUnit): number {
  return 1 / UNITS_PER_BOHR[unit];
}

/** Converts a value in a canonical value unit (from parseValueUnit) to atomic units. */
export function valueToAtomicUnits(
  quantity: RadialDataQuantity,
  unit: string,
): (v: number) => number {
  if (quantity === 'potential') return unit === 'eV' ? evToHartree : (v) => v;
  const length = unit.slice(0, unit.indexOf('^')) as RadialLengthUnit;
  const p = UNITS_PER_BOHR[length];
  // A value per length^k becomes a value per bohr^k: multiply by (length units per bohr)^k.
  const factor = quantity === 'R' ? Math.pow(p, 1.5) : p;
  return (v) => v * factor;
}
