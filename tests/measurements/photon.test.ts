import { describe, expect, it } from 'vitest';
import { AVOGADRO_NA, LIGHT_C, PLANCK_H, photonsFromWatts, wattsFromPhotons } from '../../src/engine';

describe('photon conversion', () => {
  it('uses the exact CODATA 2018 constants h, c and N_A (Tiesinga et al. 2021, CODATA 2018, Rev. Mod. Phys. 93, 025010)', () => {
    expect(PLANCK_H).toBe(6.62607015e-34);
    expect(LIGHT_C).toBe(299792458);
    expect(AVOGADRO_NA).toBe(6.02214076e23);
  });

  it('turns 1 W at 550 nm into 4.597641 µmol/s (CODATA 2018 constants; check quoted in /work/shared/data/README.md)', () => {
    expect(photonsFromWatts(1, 550)).toBeCloseTo(4.597641, 6);
  });

  it('scales with wavelength: 1 W at 400 nm and 700 nm carry 400/550 and 700/550 of that flux (E = hc/λ)', () => {
    expect(photonsFromWatts(1, 400) / photonsFromWatts(1, 550)).toBeCloseTo(400 / 550, 12);
    expect(photonsFromWatts(1, 700) / photonsFromWatts(1, 550)).toBeCloseTo(700 / 550, 12);
  });

  it('turns photons back into watts', () => {
    expect(wattsFromPhotons(photonsFromWatts(3.5, 655), 655)).toBeCloseTo(3.5, 12);
  });
});
