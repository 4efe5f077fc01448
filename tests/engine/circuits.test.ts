import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { continuousLimit, fixtureCurrent, fixturesPerCircuit, planCircuits } from '../../src/engine/circuits';

// NFPA 70, National Electrical Code (2023), 210.19(A)(1) and 210.20(A): branch-circuit conductors and
// overcurrent devices serving continuous loads are sized at 125 % of the continuous load, so a
// continuous load may use at most 80 % of the breaker rating.
describe('circuits', () => {
  it('draws W / (V × PF) per fixture: 630 W at PF 0.95 on 240 V is 2.763 A', () => {
    expect(fixtureCurrent(630, 240, 0.95)).toBeCloseTo(630 / 228, 12);
    expect(fixtureCurrent(630, 240, 0.95)).toBeCloseTo(2.7632, 4);
  });

  it('allows 80 % of the rating for a continuous load (NEC 210.19(A)(1), 210.20(A)): 16 A on a 20 A breaker', () => {
    expect(continuousLimit(20)).toBe(16);
    expect(continuousLimit(15)).toBe(12);
  });

  it('puts 5 fixtures of 630 W at PF 0.95 on a 20 A, 240 V circuit (the NEC 80 % rule applied)', () => {
    expect(fixturesPerCircuit({ wallWatts: 630, volts: 240, breakerAmps: 20, powerFactor: 0.95 })).toBe(5);
  });

  it('counts a fixture that lands exactly on the 80 % limit: 4 × 4 A on a 20 A breaker', () => {
    expect(fixturesPerCircuit({ wallWatts: 960, volts: 240, breakerAmps: 20, powerFactor: 1 })).toBe(4);
  });

  it('puts 1 fixture of 1000 W at PF 1 on a 20 A, 120 V circuit (8.3 A each, 16 A limit)', () => {
    expect(fixturesPerCircuit({ wallWatts: 1000, volts: 120, breakerAmps: 20, powerFactor: 1 })).toBe(1);
  });

  it('reports no circuit count when one fixture alone exceeds the continuous limit', () => {
    const plan = planCircuits({ wallWatts: 2000, volts: 120, breakerAmps: 15, powerFactor: 1 }, 3);
    expect(plan.fixturesPerCircuit).toBe(0);
    expect(plan.circuits).toBeNull();
    expect(plan.heaviestCircuitAmps).toBeNull();
  });

  it('rounds a leveled fractional count up before dividing it over circuits: 17.2 fixtures at 5 per circuit need 4 circuits', () => {
    const plan = planCircuits({ wallWatts: 630, volts: 240, breakerAmps: 20, powerFactor: 0.95 }, 17.2);
    expect(plan.fixtures).toBe(18);
    expect(plan.circuits).toBe(4);
    expect(plan.heaviestCircuitAmps).toBeCloseTo(5 * (630 / 228), 10);
  });

  it('needs exactly n / per-circuit circuits when that divides evenly, and none for an empty room', () => {
    const input = { wallWatts: 630, volts: 240, breakerAmps: 20, powerFactor: 0.95 };
    expect(planCircuits(input, 25).circuits).toBe(5);
    expect(planCircuits(input, 0).circuits).toBe(0);
  });

  it('never loads a circuit above 80 % and always fills it as far as one more fixture would break that', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 2000, noNaN: true }),
        fc.constantFrom(120, 208, 240, 277, 347, 480),
        fc.constantFrom(15, 20, 30, 40, 50),
        fc.double({ min: 0.5, max: 1, noNaN: true }),
        (wallWatts, volts, breakerAmps, powerFactor) => {
          const n = fixturesPerCircuit({ wallWatts, volts, breakerAmps, powerFactor });
          const amps = fixtureCurrent(wallWatts, volts, powerFactor);
          expect(n * amps).toBeLessThanOrEqual(0.8 * breakerAmps * (1 + 1e-9));
          expect((n + 1) * amps).toBeGreaterThan(0.8 * breakerAmps);
        },
      ),
    );
  });

  it('refuses inputs that cannot describe a circuit', () => {
    expect(() => fixturesPerCircuit({ wallWatts: 630, volts: 0, breakerAmps: 20, powerFactor: 0.95 })).toThrow(RangeError);
    expect(() => fixturesPerCircuit({ wallWatts: 630, volts: 240, breakerAmps: 20, powerFactor: 1.2 })).toThrow(RangeError);
  });
});
