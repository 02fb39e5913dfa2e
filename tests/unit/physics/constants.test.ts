// CODATA 2022 constants and unit conversions against REFERENCE.md §1 (CODATA 2022 column; SciPy 1.17.1 table).
import { describe, expect, it } from 'vitest';
import * as k from '../../../shared/physics/constants';
import * as u from '../../../shared/physics/units';
import { NUCLEAR_MASSES, massRatioForNucleus } from '../../../shared/physics/reduced-mass';
import { expectClose } from './close-to';

describe('CODATA 2022 constants (REFERENCE.md §1)', () => {
  it('when read, then each equals the tabulated CODATA 2022 value', () => {
    expect(k.BOHR_RADIUS_M).toBe(5.29177210544e-11);
    expect(k.RYDBERG_CONSTANT_PER_M).toBe(10973731.568157);
    expect(k.RYDBERG_ENERGY_EV).toBe(13.60569312299);
    expect(k.RYDBERG_ENERGY_J).toBe(2.179872361103e-18);
    expect(k.HARTREE_J).toBe(4.359744722206e-18);
    expect(k.HARTREE_EV).toBe(27.211386245981);
    expect(k.ELECTRON_PROTON_MASS_RATIO).toBe(5.446170214889e-4);
    expect(k.PROTON_ELECTRON_MASS_RATIO).toBe(1836.152673426);
    expect(k.FINE_STRUCTURE_CONSTANT).toBe(7.2973525643e-3);
    expect(k.INVERSE_FINE_STRUCTURE_CONSTANT).toBe(137.035999177);
    expect(k.ELECTRON_MASS_KG).toBe(9.1093837139e-31);
    expect(k.PROTON_MASS_KG).toBe(1.67262192595e-27);
    // Exact SI 2019 defining constants.
    expect(k.PLANCK_CONSTANT).toBe(6.62607015e-34);
    expect(k.SPEED_OF_LIGHT).toBe(299792458);
    expect(k.ELEMENTARY_CHARGE).toBe(1.602176634e-19);
  });

  it('when combined, then the textbook identities hold to the stated digits (REFERENCE.md §1 "Verified" column)', () => {
    const hbar = k.PLANCK_CONSTANT / (2 * Math.PI);
    // a0 = ħ/(m_e c α): 11.3 digits for 2022.
    expectClose(
      hbar / (k.ELECTRON_MASS_KG * k.SPEED_OF_LIGHT * k.FINE_STRUCTURE_CONSTANT),
      k.BOHR_RADIUS_M,
      { rel: 1e-11 },
    );
    // R∞ = α² m_e c/(2h): 11.0 digits.
    expectClose(
      (k.FINE_STRUCTURE_CONSTANT ** 2 * k.ELECTRON_MASS_KG * k.SPEED_OF_LIGHT) /
        (2 * k.PLANCK_CONSTANT),
      k.RYDBERG_CONSTANT_PER_M,
      { rel: 3e-11 },
    );
    // hcR∞/e in eV: 13.4 digits; E_h = 2hcR∞: 14.3 digits; E_h in eV = 2R∞hc/e: 15 digits.
    expectClose(
      (k.RYDBERG_CONSTANT_PER_M * k.PLANCK_CONSTANT * k.SPEED_OF_LIGHT) / k.ELEMENTARY_CHARGE,
      k.RYDBERG_ENERGY_EV,
      { rel: 1e-13 },
    );
    expectClose(2 * k.RYDBERG_CONSTANT_PER_M * k.PLANCK_CONSTANT * k.SPEED_OF_LIGHT, k.HARTREE_J, {
      rel: 1e-13,
    });
    expectClose(1 / k.PROTON_ELECTRON_MASS_RATIO, k.ELECTRON_PROTON_MASS_RATIO, { rel: 1e-12 });
    expectClose(1 / k.FINE_STRUCTURE_CONSTANT, k.INVERSE_FINE_STRUCTURE_CONSTANT, { rel: 1e-11 });
  });

  it('when the ¹H reduced mass is formed, then it matches REFERENCE.md §1 (derived, CODATA 2022 column)', () => {
    const mu = massRatioForNucleus(NUCLEAR_MASSES.hydrogen1);
    expectClose(mu, 0.9994556794247615, { rel: 1e-15 });
    expectClose(k.BOHR_RADIUS_M / mu, 5.294654094602e-11, { rel: 1e-12 });
    expectClose(k.RYDBERG_CONSTANT_PER_M * mu, 10967758.340277, { rel: 1e-13 });
    expectClose(k.RYDBERG_ENERGY_EV * mu, 13.598287264283, { rel: 1e-13 });
  });

  it('when deuteron and alpha-particle masses are read, then they are the CODATA 2022 ratios (values from memory)', () => {
    expect(k.DEUTERON_ELECTRON_MASS_RATIO).toBe(3670.482967655);
    expect(k.ALPHA_PARTICLE_ELECTRON_MASS_RATIO).toBe(7294.29954171);
  });
});

describe('unit conversions (CODATA 2022 a0, E_h)', () => {
  it('when lengths are converted, then bohr ↔ pm ↔ Å round-trip and 1.5 a0 is 79.376 58 pm (REFERENCE.md §7, 2018 value, agrees to 7e-10)', () => {
    expectClose(u.bohrToPm(1.5), 79.37658163545, { rel: 1e-9 });
    expectClose(u.bohrToPm(1), 52.9177210544, { rel: 1e-15 });
    expectClose(u.bohrToAngstrom(1), 0.529177210544, { rel: 1e-15 });
    expectClose(u.pmToBohr(u.bohrToPm(3.7)), 3.7, { rel: 1e-15 });
    expectClose(u.angstromToBohr(u.bohrToAngstrom(3.7)), 3.7, { rel: 1e-15 });
  });

  it('when energies are converted, then hartree ↔ eV ↔ cm⁻¹ agree with CODATA', () => {
    expectClose(u.hartreeToEv(1), 27.211386245981, { rel: 1e-15 });
    expectClose(u.evToHartree(13.60569312299), 0.5, { rel: 1e-12 });
    expectClose(u.hartreeToWavenumber(0.5), 109737.31568157, { rel: 1e-14 });
    expectClose(u.wavenumberToHartree(u.hartreeToWavenumber(0.25)), 0.25, { rel: 1e-15 });
    expectClose(u.hartreeToJoule(1), 4.359744722206e-18, { rel: 1e-15 });
    // Lyman α infinite mass: λ = 4/(3R∞) (REFERENCE.md §3, CODATA 2022: 121.502 273 411 018 nm).
    expectClose(u.hartreeToWavelengthNm(0.375), 121.502273411018, { rel: 1e-12 });
    expectClose(u.wavelengthNmToHartree(121.502273411018), 0.375, { rel: 1e-12 });
  });
});
