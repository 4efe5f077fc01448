import { describe, expect, it } from 'vitest';
import { MAX_PHOTON_EFFICACY } from '../../src/contracts/scenario';
import { efficacyBreakevenFigures, presentValueGap } from '../../src/engine';
import type { EfficacyBreakeven } from '../../src/engine';
import { annuityRoom } from '../sensitivity/fixtures';


const breakeven = (factor: number | null, hi = 10): EfficacyBreakeven =>
  ({ vary: 'a', against: 'b', factor, kind: factor === null ? null : 'crossing', gapAtFactor: null, searched: [0.1, hi] });

describe('presentValueGap', () => {
  // PV = n × price + E × tariff × AF in annuityRoom (NIST Handbook 135's uniform present value factor,
  // via the financial package's pv, a port of numpy-financial).
  const { scenario: s, af, count, kwh } = annuityRoom();
  const pv = (eff: number, price: number, tariff: number) => count(eff) * price + kwh(eff) * tariff * af;

  it('matches the annuity present values worked with the financial package at the scenario price', () => {
    const expected = pv(1.5, 250, 0.2) - pv(2.8, 900, 0.2);
    const gap = presentValueGap(s, 'cheap', 'frugal');
    expect(Math.abs(gap.toNumber() - expected)).toBeLessThan(1e-6);
  });

  it('matches them at a price of 0, where only the fixtures are paid for', () => {
    const gap = presentValueGap(s, 'cheap', 'frugal', '0');
    expect(Math.abs(gap.toNumber() - (count(1.5) * 250 - count(2.8) * 900))).toBeLessThan(1e-9);
  });

  it('changes sign when the options swap places', () => {
    expect(presentValueGap(s, 'frugal', 'cheap').toString()).toBe(presentValueGap(s, 'cheap', 'frugal').neg().toString());
  });
});

describe('efficacyBreakevenFigures', () => {
  it('puts a multiplier of 0.8 on 2.5 µmol/J as 2.0 µmol/J, a 20 % loss', () => {
    const f = efficacyBreakevenFigures(breakeven(0.8), 2.5);
    expect(f.breakevenEfficacy).toBeCloseTo(2, 12);
    expect(f.changePct).toBeCloseTo(-20, 12);
  });

  it('puts a multiplier of 1.25 on 2 µmol/J as 2.5 µmol/J, 25 % more', () => {
    const f = efficacyBreakevenFigures(breakeven(1.25), 2);
    expect(f.breakevenEfficacy).toBeCloseTo(2.5, 12);
    expect(f.changePct).toBeCloseTo(25, 12);
  });

  it('says when the top of the range searched is the physical limit for 400–700 nm', () => {
    const efficacy = 1.7;
    expect(efficacyBreakevenFigures(breakeven(null, MAX_PHOTON_EFFICACY / efficacy), efficacy).topIsPhysicalLimit).toBe(true);
    const f = efficacyBreakevenFigures(breakeven(null, 2), efficacy);
    expect(f.topIsPhysicalLimit).toBe(false);
    expect(f.topEfficacy).toBeCloseTo(3.4, 12);
    expect(f.breakevenEfficacy).toBeNull();
    expect(f.changePct).toBeNull();
  });
});
