import { describe, expect, it } from 'vitest';
import { bandPhotonFluxDensity } from '../../src/engine';

describe('bandPhotonFluxDensity', () => {
  it('takes the band share of the PPFD: 20 % blue of 800 µmol m⁻² s⁻¹ is 160 µmol m⁻² s⁻¹', () => {
    expect(bandPhotonFluxDensity(800, 20)).toBe(160);
  });

  it('adds the blue, green and red bands back up to the PPFD (their shares make 100 %)', () => {
    const shares = [17.3, 24.9, 57.8];
    const sum = shares.reduce((t, p) => t + bandPhotonFluxDensity(612.5, p), 0);
    expect(sum).toBeCloseTo(612.5, 9);
  });

  it('reads far-red, given as a share of the 400–700 nm photons, against the same PPFD: 8 % of 500 is 40', () => {
    expect(bandPhotonFluxDensity(500, 8)).toBe(40);
  });
});
