import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lightingHeatWatts, planCircuits, wattsToBtuPerHour } from '../../src/engine';

// Lighting heat gain q = W × Ful × Fsa: ASHRAE Handbook—Fundamentals, chapter on nonresidential
// cooling and heating loads (recalled from memory); every fixture on (Ful = 1), ballast in the wall
// power (Fsa = 1). W → BTU_IT/h factor 3.412 142 from NIST SP 811 (2008), Appendix B.8.
describe('lightingHeatWatts', () => {
  it('is all the power drawn at the wall: 17 fixtures of 630 W give off 10 710 W', () => {
    expect(lightingHeatWatts(17, 630)).toBe(10_710);
  });

  it('is 10 710 W × 3.412142 = 36 544.04 BTU/h in imperial units (NIST SP 811, B.8)', () => {
    expect(wattsToBtuPerHour(lightingHeatWatts(17, 630))).toBeCloseTo(36_544.04082, 5);
  });

  it('grows in proportion to the number of fixtures', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 500 }), fc.integer({ min: 1, max: 2000 }), (n, w) => lightingHeatWatts(2 * n, w) === 2 * lightingHeatWatts(n, w)));
  });
});

describe('planCircuits heat', () => {
  it('counts the heat of the whole fixtures wired: 17.2 leveled fixtures of 630 W are 18 fixtures, 11 340 W', () => {
    const plan = planCircuits({ wallWatts: 630, volts: 240, breakerAmps: 20, powerFactor: 0.95 }, 17.2);
    expect(plan.fixtures).toBe(18);
    expect(plan.heatWatts).toBe(11_340);
  });

  it('gives 16 A as the continuous limit of a 20 A breaker in the plan (NEC 210.19(A)(1), 210.20(A))', () => {
    expect(planCircuits({ wallWatts: 630, volts: 240, breakerAmps: 20, powerFactor: 0.95 }, 1).continuousLimitAmps).toBe(16);
  });
});
