import { npv } from 'financial';
import { describe, expect, it } from 'vitest';
import { computeScenario } from '../../src/engine';
import { baseInput, ledOption, scenario } from '../support/scenarios';

// Fuller, S.K. & Petersen, S.R. (1995), Life-Cycle Costing Manual for the Federal Energy Management
// Program, NIST Handbook 135, end-of-year discounting. SPV = 1/(1+d)^t; UPV = Σ 1/(1+d)^t;
// UPV* = Σ ((1+e)/(1+d))^t (energy escalating at e from a base-year price).
const oneKwhScenario = (over: Record<string, unknown>) =>
  scenario(
    baseInput({
      canopy: { lengthM: 1, widthM: 1 },
      target: { ppfd: 1 },
      schedule: [{ label: 'all', hoursPerDay: 1, daysPerYear: 1 }],
      baseline: 'led',
      // one fixture of 1000 W with 1 µmol/s reaching 1 m²: exactly 1 kWh per year
      options: [ledOption({ wallWatts: 1000, photonEfficacy: undefined, ppf: 1, fixturePrice: '0' })],
      ...over,
    }),
  );

describe('present value (NIST Handbook 135)', () => {
  it('discounts one amount in year 5 at 5 % by SPV = 0.7835262 (Handbook 135)', () => {
    // lit 1 h a year for 6 years, one lamp set of 1 replaced every 5 h: a single outlay of 1 at the end of year 5
    const lamp = { price: '1', replaceEveryHours: 5, outputAtReplacementPct: 100 };
    const r = computeScenario(
      oneKwhScenario({
        horizonYears: 6,
        discountRatePct: 5,
        electricity: { pricePerKwh: '0' },
        options: [ledOption({ wallWatts: 1000, photonEfficacy: undefined, ppf: 1, fixturePrice: '0', lamp })],
      }),
    );
    const o = r.options[0]!;
    expect(o.years.map((y) => y.lamps)).toEqual(['0', '0', '0', '0', '0', '1', '0']);
    expect(Number(o.totalPresentValue)).toBeCloseTo(0.7835262, 7);
  });

  it('discounts 1 a year for 10 years at 3 % by UPV = 8.5302028 (Handbook 135)', () => {
    const r = computeScenario(oneKwhScenario({ horizonYears: 10, discountRatePct: 3, electricity: { pricePerKwh: '1' } }));
    expect(Number(r.options[0]!.totalPresentValue)).toBeCloseTo(8.5302028, 7);
  });

  it('discounts energy escalating 1 % a year at 3 % over 10 years by UPV* = 8.9918986 (Handbook 135)', () => {
    // Handbook 135 escalates from the base year, so year 1 already costs (1 + e); our tariff is the
    // year-1 price, so entering 1.01 reproduces the handbook's cash flows exactly.
    const r = computeScenario(oneKwhScenario({ horizonYears: 10, discountRatePct: 3, electricity: { pricePerKwh: '1.01', escalationPctPerYear: 1 } }));
    expect(Number(r.options[0]!.totalPresentValue)).toBeCloseTo(8.9918986, 7);
  });

  it('agrees with the `financial` package (a port of numpy-financial) npv over the yearly totals', () => {
    const r = computeScenario(
      scenario(baseInput({ discountRatePct: 7, horizonYears: 12, electricity: { pricePerKwh: '0.31', escalationPctPerYear: 2.5, demandChargePerKwMonth: '3' }, cooling: { cop: 2.8, share: 0.9 } })),
    );
    for (const o of r.options) {
      const flows = o.years.map((y) => Number(y.total));
      // numpy-financial's npv discounts values[0] at t = 0, matching our year-0 capital
      expect(Number(o.totalPresentValue)).toBeCloseTo(npv(0.07, flows), 6);
    }
  });

  it('equals the nominal total when the discount rate is 0', () => {
    const r = computeScenario(scenario(baseInput({ discountRatePct: 0 })));
    for (const o of r.options) expect(o.totalPresentValue).toBe(o.totalNominal);
  });
});
