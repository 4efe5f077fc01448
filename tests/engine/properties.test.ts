import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { ScenarioInput } from '../../src/contracts/scenario';
import { compileFast, computeScenario, fastPresentValue } from '../../src/engine';
import { scenarioArb } from '../support/arbitraries';
import { scenario } from '../support/scenarios';

const compute = (input: ScenarioInput) => computeScenario(scenario(input));
const relClose = (a: number, b: number, tol: number) => Math.abs(a - b) <= tol * Math.max(1, Math.abs(a), Math.abs(b));

describe('engine properties', () => {
  it('scales exact fixture counts linearly with canopy area and with target', () => {
    fc.assert(
      fc.property(scenarioArb, fc.double({ min: 0.25, max: 2, noNaN: true }), (input, k) => {
        const base = compute(input);
        const wider = compute({ ...input, canopy: { lengthM: input.canopy.lengthM * k, widthM: input.canopy.widthM } });
        const brighter = compute({ ...input, target: { ppfd: (input.target.ppfd ?? 0) * k } });
        base.options.forEach((o, i) => {
          expect(relClose(wider.options[i]!.fixturesExact, o.fixturesExact * k, 1e-9)).toBe(true);
          expect(relClose(brighter.options[i]!.fixturesExact, o.fixturesExact * k, 1e-9)).toBe(true);
        });
      }),
      { numRuns: 60 },
    );
  });

  it('never buys fewer whole fixtures than the exact count', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        for (const o of compute(input).options) {
          expect(o.fixturesWhole).toBeGreaterThanOrEqual(o.fixturesExact - 1e-9);
          expect(o.fixturesWhole - o.fixturesExact).toBeLessThan(1);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('never lowers any total when the tariff rises', () => {
    fc.assert(
      fc.property(scenarioArb, fc.integer({ min: 1, max: 100 }), (input, cents) => {
        const low = compute(input);
        const price = (Number(input.electricity.pricePerKwh) + cents / 100).toFixed(2);
        const high = compute({ ...input, electricity: { ...input.electricity, pricePerKwh: price } });
        low.options.forEach((o, i) => {
          expect(Number(high.options[i]!.totalNominal)).toBeGreaterThanOrEqual(Number(o.totalNominal));
          expect(Number(high.options[i]!.totalPresentValue)).toBeGreaterThanOrEqual(Number(o.totalPresentValue));
        });
      }),
      { numRuns: 60 },
    );
  });

  it('keeps present value at or below nominal when costs are positive and the discount rate is not negative', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        for (const o of compute(input).options) {
          if (o.years.some((y) => Number(y.total) < 0)) continue; // a rebate above the price makes year 0 negative
          expect(Number(o.totalPresentValue)).toBeLessThanOrEqual(Number(o.totalNominal) * (1 + 1e-12));
        }
      }),
      { numRuns: 100 },
    );
  });

  it('has the fast path agree with the decimal ledger to 1e-6 relative', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        const s = scenario(input);
        const fast = compileFast(s);
        computeScenario(s).options.forEach((o, i) => {
          expect(relClose(fastPresentValue(fast, i, Number(s.electricity.pricePerKwh)), Number(o.totalPresentValue), 1e-6)).toBe(true);
        });
      }),
      { numRuns: 200 },
    );
  });

  it('adds the yearly rows up to the totals', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        for (const o of compute(input).options) {
          const sum = o.years.reduce((acc, y) => acc + Number(y.total), 0);
          expect(relClose(sum, Number(o.totalNominal), 1e-9)).toBe(true);
          expect(o.years.at(-1)!.cumulative).toBe(o.totalNominal);
          const parts = Number(o.capex) + Number(o.energyCost) + Number(o.coolingCost) + Number(o.demandCost) + Number(o.lampCost);
          expect(relClose(parts, Number(o.totalNominal), 1e-9)).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('gives the same input hash to two files that mean the same scenario', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        const asNumbers = { ...input, electricity: { ...input.electricity, pricePerKwh: Number(input.electricity.pricePerKwh) } };
        expect(compute(asNumbers).inputHash).toBe(compute(input).inputHash);
      }),
      { numRuns: 30 },
    );
  });
});
