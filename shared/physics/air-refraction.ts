/**
 * Refractive index of standard air and the vacuum → air wavelength conversion.
 *
 * Source: Peck & Reeder, J. Opt. Soc. Am. 62, 958 (1972) (coefficients from memory, as in
 * REFERENCE.md §3; the formula NIST ASD is believed to use):
 *   (n − 1)·10⁸ = 8060.51 + 2 480 990/(132.274 − σ²) + 17 455.7/(39.329 57 − σ²),  σ = 1/λ_vac in µm⁻¹.
 * Valid only above 200 nm (vacuum); below that there is no air wavelength and null is returned.
 */
import { OrbitalInputError } from './orbital-input-error';

/** Shortest vacuum wavelength (nm) for which an air wavelength is given. */
export const AIR_WAVELENGTH_MIN_NM = 200;

export function airRefractiveIndex(vacuumNm: number): number {
  const sigma2 = (1000 / vacuumNm) ** 2;
  return 1 + (8060.51 + 2480990 / (132.274 - sigma2) + 17455.7 / (39.32957 - sigma2)) * 1e-8;
}

/** λ_air = λ_vac / n_air(λ_vac), or null below 200 nm. */
export function vacuumToAirWavelength(vacuumNm: number): number | null {
  if (typeof vacuumNm !== 'number' || !(vacuumNm > 0))
    throw new OrbitalInputError(
      'wavelength',
      `must be a positive number of nm, got ${String(vacuumNm)}`,
    );
  if (vacuumNm < AIR_WAVELENGTH_MIN_NM) return null;
  if (!Number.isFinite(vacuumNm)) return vacuumNm;
  return vacuumNm / airRefractiveIndex(vacuumNm);
}
