// Energy levels (REFERENCE.md §2), line wavelengths and air conversion (§3), effective potential.
import { describe, expect, it } from 'vitest';
import { energyLevel, energyLevelEv, energyLevels } from '../../../shared/physics/energy-levels';
import { seriesName, spectralLine, spectralSeries } from '../../../shared/physics/spectral-lines';
import { vacuumToAirWavelength } from '../../../shared/physics/air-refraction';
import {
  effectivePotential,
  effectivePotentialCurve,
} from '../../../shared/physics/effective-potential';
import { NUCLEAR_MASSES, massRatioForNucleus } from '../../../shared/physics/reduced-mass';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { expectClose } from './close-to';

const muH = massRatioForNucleus(NUCLEAR_MASSES.hydrogen1);

describe('energy levels (REFERENCE.md §2; Bethe & Salpeter 1957 §2)', () => {
  it('when infinite mass, then E_n = −Z²/(2n²) hartree, and in eV with CODATA 2022 hcR∞ = 13.605 693 122 990 eV', () => {
    expect(energyLevel(1)).toBe(-0.5);
    expect(energyLevel(2)).toBe(-0.125);
    expectClose(energyLevel(3), -0.05555555555555556, { rel: 1e-15 });
    expect(energyLevel(4)).toBe(-0.03125);
    expect(energyLevel(1, 2)).toBe(-2);
    expectClose(energyLevelEv(1), -13.60569312299, { rel: 1e-13 }); // E_h/2 vs hcR∞: the two CODATA entries agree to 4e-14
    expectClose(energyLevelEv(1, 2), -4 * 13.60569312299, { rel: 1e-13 });
    expectClose(energyLevelEv(1, 92), -92 * 92 * 13.60569312299, { rel: 1e-13 });
  });

  it('when the ¹H reduced mass is used, then E_1 = −hcR_H = −13.598 287 264 283 eV (REFERENCE.md §1, CODATA 2022 column)', () => {
    expectClose(energyLevelEv(1, 1, muH), -13.598287264283, { rel: 1e-13 });
    expectClose(energyLevelEv(2, 1, muH), -13.598287264283 / 4, { rel: 1e-13 });
  });

  it('when compared with the measured ionization energy of H (NIST ASD, from memory), then agreement is within 3e-5', () => {
    expectClose(-energyLevelEv(1, 1, muH), 13.598434599702, { rel: 3e-5 });
  });

  it('when listed, then the degeneracy is n²', () => {
    expect(energyLevels(3).map((e) => e.degeneracy)).toEqual([1, 4, 9]);
  });
});

describe('spectral lines (REFERENCE.md §3, CODATA 2022 values)', () => {
  it('when infinite mass, then Lyα, Hα, Hβ match the closed forms 4/(3R∞), 36/(5R∞), 16/(3R∞) to 1e-12', () => {
    expectClose(spectralLine(2, 1).vacuumNm, 121.502273411018, { rel: 1e-12 });
    expectClose(spectralLine(3, 2).vacuumNm, 656.112276419498, { rel: 1e-12 });
    expectClose(spectralLine(4, 2).vacuumNm, 486.009093644073, { rel: 1e-12 });
    expectClose(spectralLine(5, 2).vacuumNm, (100 / (21 * 10973731.568157)) * 1e9, { rel: 1e-12 });
  });

  it('when the ¹H reduced mass is used, then the vacuum wavelengths match REFERENCE.md §3 to 1e-12', () => {
    expectClose(spectralLine(2, 1, 1, muH).vacuumNm, 121.568445617267, { rel: 1e-12 });
    expectClose(spectralLine(3, 2, 1, muH).vacuumNm, 656.469606333244, { rel: 1e-12 });
    expectClose(spectralLine(4, 2, 1, muH).vacuumNm, 486.27378246907, { rel: 1e-12 });
  });

  it('when converted to air with Peck & Reeder (from memory), then the REFERENCE.md §3 air values (from CODATA 2018 vacuum values) come out', () => {
    expectClose(vacuumToAirWavelength(656.469606333064)!, 656.288316345, { rel: 2e-12 });
    expectClose(vacuumToAirWavelength(486.273782468936)!, 486.137985954, { rel: 2e-12 });
    expectClose(vacuumToAirWavelength(434.17302006155)!, 434.050992514, { rel: 2e-12 });
    expect(spectralLine(2, 1).airNm).toBeNull();
    expect(vacuumToAirWavelength(199.9)).toBeNull();
  });

  it('when compared with measured Balmer air wavelengths (NIST ASD, from memory), then agreement is within 3e-5', () => {
    expectClose(spectralLine(3, 2, 1, muH).airNm!, 656.279, { rel: 3e-5 });
    expectClose(spectralLine(4, 2, 1, muH).airNm!, 486.135, { rel: 3e-5 });
    expectClose(spectralLine(5, 2, 1, muH).airNm!, 434.0472, { rel: 3e-5 });
    expectClose(spectralLine(2, 1, 1, muH).vacuumNm, 121.567364, { rel: 3e-5 });
  });

  it('when the lower level is 1…6, then the series is named; above 6, none', () => {
    expect([1, 2, 3, 4, 5, 6, 7].map(seriesName)).toEqual([
      'Lyman',
      'Balmer',
      'Paschen',
      'Brackett',
      'Pfund',
      'Humphreys',
      null,
    ]);
    expect(spectralSeries(2, 6).map((l) => l.nUpper)).toEqual([3, 4, 5, 6]);
    expectClose(spectralLine(3, 2).energyHartree, 5 / 72, { rel: 1e-15 });
  });

  it('when deuterium replaces ¹H, then Hα moves to the blue by about 0.179 nm (isotope shift; textbook value from memory)', () => {
    const muD = massRatioForNucleus(NUCLEAR_MASSES.hydrogen2);
    const shift = spectralLine(3, 2, 1, muH).airNm! - spectralLine(3, 2, 1, muD).airNm!;
    expectClose(shift, 0.179, { rel: 0.01 });
  });

  it('when He⁺ (Z = 2), then wavelengths shrink by Z² (Rydberg formula)', () => {
    expectClose(
      spectralLine(4, 3, 2).vacuumNm,
      (spectralLine(2, 1).vacuumNm * (3 / 4)) / (7 / 144) / 4,
      { rel: 1e-14 },
    );
  });

  it('when levels are misordered, then OrbitalInputError names nUpper', () => {
    expect(() => spectralLine(2, 3)).toThrow(OrbitalInputError);
    expect(() => spectralLine(2, 2)).toThrow(/nUpper/);
  });
});

describe('effective potential', () => {
  it('when evaluated, then V_eff = −Z/r + l(l+1)/(2μr²)', () => {
    expect(effectivePotential(2, 0)).toBe(-0.5);
    expectClose(effectivePotential(2, 1, 1), -0.5 + 2 / 8, { rel: 1e-15 });
    expectClose(effectivePotential(2, 2, 3, 0.5), -1.5 + 6 / 4, { abs: 1e-15 });
  });

  it('when a curve is asked for, then the samples, the levels (n > l) and the turning points V_eff(r_t) = E_n come out', () => {
    const curve = effectivePotentialCurve({ l: 2, Z: 1, rMin: 0.5, rMax: 40, points: 50, nMax: 6 });
    expect(curve.r.length).toBe(50);
    expect(curve.r[0]).toBe(0.5);
    expect(curve.r[49]).toBe(40);
    expect(curve.levels.map((lv) => lv.n)).toEqual([3, 4, 5, 6]);
    for (const lv of curve.levels) {
      expectClose(effectivePotential(lv.innerTurningPoint, 2), lv.energy, { rel: 1e-12 }, lv);
      expectClose(effectivePotential(lv.outerTurningPoint, 2), lv.energy, { rel: 1e-12 }, lv);
    }
    const s = effectivePotentialCurve({ l: 0, rMin: 0.1, rMax: 10, points: 3, spacing: 'log' });
    expectClose(s.r[1], 1, { rel: 1e-15 });
    expect(s.levels[0]).toEqual({ n: 1, energy: -0.5, innerTurningPoint: 0, outerTurningPoint: 2 });
  });

  it('when the range is bad, then the field is named', () => {
    expect(() => effectivePotentialCurve({ l: 0, rMin: 0, rMax: 1, points: 10 })).toThrow(/rMin/);
    expect(() => effectivePotentialCurve({ l: 0, rMin: 1, rMax: 0.5, points: 10 })).toThrow(/rMax/);
    expect(() => effectivePotentialCurve({ l: 0, rMin: 1, rMax: 2, points: 1 })).toThrow(/points/);
  });
});
