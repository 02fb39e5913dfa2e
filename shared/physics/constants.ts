/**
 * Physical constants used by the orbital computation.
 *
 * Source: CODATA 2022 recommended values (NIST, published 2024; bibliographic details from memory),
 * as tabulated in scipy.constants 1.17.1 and in the project's REFERENCE.md §1. Exact values are the
 * defining constants of the 2019 SI. Each constant names its edition beside it; values marked
 * "from memory" were recalled, not read from the CODATA table.
 */

/** Planck constant h in J s. Exact (SI 2019). */
export const PLANCK_CONSTANT = 6.62607015e-34;
/** Speed of light in vacuum c in m/s. Exact (SI 2019). */
export const SPEED_OF_LIGHT = 299_792_458;
/** Elementary charge e in C. Exact (SI 2019). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Reduced Planck constant ħ = h/2π in J s (derived from the exact h). */
export const REDUCED_PLANCK_CONSTANT = PLANCK_CONSTANT / (2 * Math.PI);

/** Bohr radius a0 in m. CODATA 2022: 5.291 772 105 44(82)e-11 m. */
export const BOHR_RADIUS_M = 5.29177210544e-11;
/** Hartree energy E_h in J. CODATA 2022: 4.359 744 722 2060(48)e-18 J. */
export const HARTREE_J = 4.359744722206e-18;
/** Hartree energy E_h in eV. CODATA 2022: 27.211 386 245 981(30) eV. */
export const HARTREE_EV = 27.211386245981;
/** Rydberg constant R∞ in 1/m. CODATA 2022: 10 973 731.568 157(12) m^-1. */
export const RYDBERG_CONSTANT_PER_M = 10_973_731.568157;
/** Rydberg energy hcR∞ in eV. CODATA 2022: 13.605 693 122 990(15) eV. */
export const RYDBERG_ENERGY_EV = 13.60569312299;
/** Rydberg energy hcR∞ in J. CODATA 2022: 2.179 872 361 1030(24)e-18 J. */
export const RYDBERG_ENERGY_J = 2.179872361103e-18;
/** Electron mass m_e in kg. CODATA 2022: 9.109 383 7139(28)e-31 kg. */
export const ELECTRON_MASS_KG = 9.1093837139e-31;
/** Proton mass m_p in kg. CODATA 2022: 1.672 621 925 95(52)e-27 kg. */
export const PROTON_MASS_KG = 1.67262192595e-27;
/** Electron–proton mass ratio m_e/m_p. CODATA 2022: 5.446 170 214 889(94)e-4. */
export const ELECTRON_PROTON_MASS_RATIO = 5.446170214889e-4;
/** Proton–electron mass ratio m_p/m_e. CODATA 2022: 1836.152 673 426(32). */
export const PROTON_ELECTRON_MASS_RATIO = 1836.152673426;
/** Fine-structure constant α. CODATA 2022: 7.297 352 5643(11)e-3. */
export const FINE_STRUCTURE_CONSTANT = 7.2973525643e-3;
/** Inverse fine-structure constant 1/α. CODATA 2022: 137.035 999 177(21). */
export const INVERSE_FINE_STRUCTURE_CONSTANT = 137.035999177;
/** Deuteron–electron mass ratio m_d/m_e. CODATA 2022: 3670.482 967 655(63) (value from memory). */
export const DEUTERON_ELECTRON_MASS_RATIO = 3670.482967655;
/** Alpha particle–electron mass ratio m_α/m_e. CODATA 2022: 7294.299 541 71(17) (value from memory). */
export const ALPHA_PARTICLE_ELECTRON_MASS_RATIO = 7294.29954171;

/** Largest nuclear charge the service accepts (uranium). */
export const MAX_NUCLEAR_CHARGE = 92;
