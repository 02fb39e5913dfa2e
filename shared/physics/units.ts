/**
 * Unit conversions for display: lengths (bohr ↔ pm ↔ Å ↔ m) and energies (hartree ↔ eV ↔ J ↔ cm⁻¹),
 * plus photon energy ↔ vacuum wavelength in nm.
 *
 * Source: CODATA 2022 values in ./constants (edition named there). Internally everything is in
 * atomic units (bohr, hartree); conversions happen only at the edges.
 */
import {
  BOHR_RADIUS_M,
  HARTREE_EV,
  HARTREE_J,
  PLANCK_CONSTANT,
  RYDBERG_CONSTANT_PER_M,
  SPEED_OF_LIGHT,
} from './constants';

/** One bohr in picometres (CODATA 2022 a0). */
export const PM_PER_BOHR = BOHR_RADIUS_M * 1e12;
/** One bohr in ångström (CODATA 2022 a0). */
export const ANGSTROM_PER_BOHR = BOHR_RADIUS_M * 1e10;
/** One hartree in cm⁻¹: E_h/(hc) = 2R∞ (CODATA 2022 R∞; the two routes agree to ~1e-12). */
export const WAVENUMBER_PER_HARTREE = (2 * RYDBERG_CONSTANT_PER_M) / 100;

export const bohrToPm = (bohr: number): number => bohr * PM_PER_BOHR;
export const pmToBohr = (pm: number): number => pm / PM_PER_BOHR;
export const bohrToAngstrom = (bohr: number): number => bohr * ANGSTROM_PER_BOHR;
export const angstromToBohr = (angstrom: number): number => angstrom / ANGSTROM_PER_BOHR;
export const bohrToMetre = (bohr: number): number => bohr * BOHR_RADIUS_M;

export const hartreeToEv = (hartree: number): number => hartree * HARTREE_EV;
export const evToHartree = (ev: number): number => ev / HARTREE_EV;
export const hartreeToJoule = (hartree: number): number => hartree * HARTREE_J;
export const hartreeToWavenumber = (hartree: number): number => hartree * WAVENUMBER_PER_HARTREE;
export const wavenumberToHartree = (perCm: number): number => perCm / WAVENUMBER_PER_HARTREE;

/**
 * Vacuum wavelength in nm of a photon carrying |ΔE| hartree: λ = 1/(ν̃), ν̃ = ΔE·2R∞.
 * Returns Infinity for ΔE = 0.
 */
export function hartreeToWavelengthNm(deltaHartree: number): number {
  return 1e9 / (Math.abs(deltaHartree) * 2 * RYDBERG_CONSTANT_PER_M);
}

/** Photon energy in hartree for a vacuum wavelength in nm (inverse of hartreeToWavelengthNm). */
export function wavelengthNmToHartree(nm: number): number {
  return 1e9 / (nm * 2 * RYDBERG_CONSTANT_PER_M);
}

/** Photon energy in J for a vacuum wavelength in nm: E = hc/λ (exact h, c). */
export function wavelengthNmToJoule(nm: number): number {
  return (PLANCK_CONSTANT * SPEED_OF_LIGHT) / (nm * 1e-9);
}
