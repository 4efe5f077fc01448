import { describe, expect, it } from 'vitest';
import { computeScenario, dliFromPpfd, level, ppfdFromDli } from '../../src/engine';
import type { Dli, Fraction, Hours, MicromolePerSecond, Ppfd, SquareMetres } from '../../src/engine/units';
import { baseInput, hpsOption, ledOption, scenario } from '../support/scenarios';

const at = (input: Parameters<typeof baseInput>[0]) => computeScenario(scenario(baseInput(input)));

describe('leveling', () => {
  it('needs n = T × A / (Φ × U × M) fixtures: 600 µmol m⁻² s⁻¹ over 20 m² from 1500 µmol/s is 8 fixtures', () => {
    const r = at({ options: [ledOption({ id: 'hps' })] });
    expect(r.canopyAreaM2).toBe(20);
    expect(r.options[0]!.fixturesExact).toBeCloseTo(8, 12);
    expect(r.options[0]!.fixturesWhole).toBe(8);
    expect(r.options[0]!.achievedPpfd).toBeCloseTo(600, 9);
  });

  it('accepts ppf in place of efficacy × watts', () => {
    const r = at({ options: [ledOption({ id: 'hps', photonEfficacy: undefined, ppf: 1500 })] });
    expect(r.options[0]!.fixturesExact).toBeCloseTo(8, 12);
  });

  it('divides by utilization: at 0.8 the same room needs 10 fixtures', () => {
    const r = at({ utilization: 0.8, options: [ledOption({ id: 'hps' })] });
    expect(r.options[0]!.fixturesExact).toBeCloseTo(10, 12);
  });

  it('levels at maintained output with the lamp output just before relamping', () => {
    const r = at({ levelAt: 'maintained', options: [hpsOption({ photonEfficacy: 1.25, wallWatts: 600 })] });
    // Φ = 750 µmol/s, M = 0.8 → 600 µmol/s per fixture; 12000 / 600 = 20
    expect(r.options[0]!.fixturesExact).toBeCloseTo(20, 12);
  });

  it('levels lampless fixtures at maintained output with the output at the horizon', () => {
    const r = at({ levelAt: 'maintained', options: [hpsOption(), ledOption({ outputAtHorizonPct: 90 })] });
    expect(r.options[1]!.fixturesExact).toBeCloseTo(12000 / 1350, 12);
  });

  it('rounds up to whole fixtures, and costs follow the count chosen', () => {
    const input = { options: [hpsOption(), ledOption({ photonEfficacy: 2.4 })] };
    const exact = at(input).options[1]!;
    const whole = at({ ...input, fixtureCount: 'whole' }).options[1]!;
    expect(exact.fixturesExact).toBeCloseTo(12000 / 1440, 12);
    expect(exact.fixturesWhole).toBe(9);
    expect(exact.fixturesUsed).toBe(exact.fixturesExact);
    expect(whole.fixturesUsed).toBe(9);
    expect(whole.achievedPpfd).toBeCloseTo((9 * 1440) / 20, 9);
    expect(whole.capex).toBe('7200');
  });

  it('does not round float noise up: 3.0000000000000004 fixtures stay 3 (tolerance 1e-9)', () => {
    const lv = level((0.1 * 3) as Ppfd, 1 as SquareMetres, 0.1 as MicromolePerSecond, 1 as Fraction, 1 as Fraction, 'whole');
    expect(lv.exact).toBeGreaterThan(3);
    expect(lv.whole).toBe(3);
    expect(level(3.001 as Ppfd, 1 as SquareMetres, 1 as MicromolePerSecond, 1 as Fraction, 1 as Fraction, 'whole').whole).toBe(4);
  });

  it('turns a DLI target into PPFD over the single photoperiod', () => {
    const r = at({ target: { dli: 25.92 } });
    expect(r.targetPpfd).toBeCloseTo(600, 9); // 25.92 × 10⁶ / (3600 × 12)
  });

  // Torres, A.P. & Lopez, R.G., "Measuring Daily Light Integral in a Greenhouse", Purdue Extension HO-238-W:
  // DLI (mol m⁻² d⁻¹) is the photon flux density integrated over the day, µmol m⁻² s⁻¹ × s ÷ 10⁶.
  // Their 24-hour factor 0.0864 (= 86 400 s ÷ 10⁶) is recalled from memory.
  it('gives DLI = PPFD × hours × 3600 / 10⁶: 200 µmol m⁻² s⁻¹ for 16 h is 11.52 mol m⁻² d⁻¹ (Purdue HO-238-W)', () => {
    expect(dliFromPpfd(200 as Ppfd, 16 as Hours)).toBeCloseTo(11.52, 12);
    expect(dliFromPpfd(100 as Ppfd, 24 as Hours)).toBeCloseTo(100 * 0.0864, 12);
    expect(ppfdFromDli(11.52 as Dli, 16 as Hours)).toBeCloseTo(200, 12);
  });

  it('adds up lit hours over every growth phase', () => {
    const r = at({ schedule: [{ label: 'veg', hoursPerDay: 18, daysPerYear: 100 }, { label: 'flower', hoursPerDay: 12, daysPerYear: 250 }] });
    expect(r.litHoursPerYear).toBe(1800 + 3000);
  });

  // Common practice (no single published source): the photon output of one 600 W fixture at
  // 1.16 µmol/J needs about 1.7 fixtures of 315 W at 1.3 µmol/J, or about 1.29 fixtures of 600 W at 0.9 µmol/J.
  it('matches the trade rule of thumb for swapping fixtures of different efficacy (common practice)', () => {
    const r = at({
      baseline: 'hps',
      options: [
        ledOption({ id: 'hps', wallWatts: 600, photonEfficacy: 1.16 }),
        ledOption({ id: 'cmh', wallWatts: 315, photonEfficacy: 1.3 }),
        ledOption({ id: 'old', wallWatts: 600, photonEfficacy: 0.9 }),
      ],
    });
    const [hps, cmh, old] = r.options;
    expect(cmh!.fixturesExact / hps!.fixturesExact).toBeCloseTo(1.7, 1);
    expect(old!.fixturesExact / hps!.fixturesExact).toBeCloseTo(1.29, 2);
  });
});
