/**
 * Line wavelengths of hydrogen-like ions from the Rydberg formula, with series names.
 *
 * Source: REFERENCE.md §3; Bethe & Salpeter (1957) §2:
 *   1/λ_vac = R∞ (μ/m_e) Z² (1/n_lower² − 1/n_upper²),  R∞ from CODATA 2022 (./constants),
 * air wavelengths by Peck & Reeder (./air-refraction, only above 200 nm). Series by lower level:
 * Lyman (1), Balmer (2), Paschen (3), Brackett (4), Pfund (5), Humphreys (6); none above 6.
 * Non-relativistic: compare with measured lines only to ~3e-5 relative (fine structure, QED).
 */
import { HARTREE_EV, RYDBERG_CONSTANT_PER_M } from './constants';
import { vacuumToAirWavelength } from './air-refraction';
import { OrbitalInputError } from './orbital-input-error';
import { checkMassRatio, checkNuclearCharge, checkPrincipal } from './quantum-numbers';

export type SeriesName = 'Lyman' | 'Balmer' | 'Paschen' | 'Brackett' | 'Pfund' | 'Humphreys';

const SERIES: readonly SeriesName[] = [
  'Lyman',
  'Balmer',
  'Paschen',
  'Brackett',
  'Pfund',
  'Humphreys',
];

export interface SpectralLine {
  nUpper: number;
  nLower: number;
  series: SeriesName | null;
  /** Photon energy in hartree and eV (positive). */
  energyHartree: number;
  energyEv: number;
  /** Wavenumber in cm⁻¹. */
  wavenumber: number;
  vacuumNm: number;
  /** null below 200 nm, where the air formula does not apply. */
  airNm: number | null;
}

export function seriesName(nLower: number): SeriesName | null {
  return SERIES[checkPrincipal(nLower, 'nLower') - 1] ?? null;
}

export function spectralLine(nUpper: number, nLower: number, Z = 1, muRatio = 1): SpectralLine {
  const up = checkPrincipal(nUpper, 'nUpper');
  const low = checkPrincipal(nLower, 'nLower');
  if (up <= low)
    throw new OrbitalInputError('nUpper', `must be greater than nLower = ${low}, got ${up}`);
  const z = checkNuclearCharge(Z);
  const mu = checkMassRatio(muRatio);
  const term = 1 / (low * low) - 1 / (up * up);
  const perMetre = RYDBERG_CONSTANT_PER_M * mu * z * z * term;
  const vacuumNm = 1e9 / perMetre;
  const energyHartree = (mu * z * z * term) / 2;
  return {
    nUpper: up,
    nLower: low,
    series: seriesName(low),
    energyHartree,
    energyEv: energyHartree * HARTREE_EV,
    wavenumber: perMetre / 100,
    vacuumNm,
    airNm: vacuumToAirWavelength(vacuumNm),
  };
}

/** The lines nLower + 1 … nUpperMax → nLower. */
export function spectralSeries(
  nLower: number,
  nUpperMax: number,
  Z = 1,
  muRatio = 1,
): SpectralLine[] {
  const low = checkPrincipal(nLower, 'nLower');
  const top = checkPrincipal(nUpperMax, 'nUpperMax');
  const lines: SpectralLine[] = [];
  for (let up = low + 1; up <= top; up++) lines.push(spectralLine(up, low, Z, muRatio));
  return lines;
}
