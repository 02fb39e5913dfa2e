/**
 * The length units a figure may print (bohr, pm, Å) with their size in bohr, from the CODATA 2022
 * conversions of shared/physics/units. Lengths stay in bohr until they are printed.
 */
import { ANGSTROM_PER_BOHR, PM_PER_BOHR } from '../physics/units';
import { FigureSpecError } from './figure-error';

export type LengthUnitKey = 'bohr' | 'pm' | 'angstrom';

export interface LengthUnit {
  key: LengthUnitKey;
  /** As printed after a number or on an axis. */
  symbol: string;
  /** How many of this unit make one bohr. */
  perBohr: number;
}

const UNITS: Record<LengthUnitKey, LengthUnit> = {
  bohr: { key: 'bohr', symbol: 'bohr', perBohr: 1 },
  pm: { key: 'pm', symbol: 'pm', perBohr: PM_PER_BOHR },
  angstrom: { key: 'angstrom', symbol: 'Å', perBohr: ANGSTROM_PER_BOHR },
};

export function lengthUnit(key: LengthUnitKey): LengthUnit {
  const unit = UNITS[key];
  if (!unit)
    throw new FigureSpecError(
      'system.lengthUnit',
      `must be "bohr", "pm" or "angstrom", got "${String(key)}"`,
    );
  return unit;
}
