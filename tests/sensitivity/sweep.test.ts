import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assembleSweep, axisValues, computeScenario, planSweep, runSweep, sweepRows } from '../../src/engine';
import { relDiff, roomArb, sixOptions, withPriceAndFactor } from './fixtures';

const settings = (vary: string, n = 200) => ({ vary, tariff: { lo: 0.05, hi: 0.6, n }, efficacy: { lo: 0.6, hi: 1.8, n } });

describe('axisValues', () => {
  it('spaces n values evenly from lo to hi, ending exactly on both', () => {
    expect(axisValues({ lo: 0.1, hi: 0.5, n: 5 })).toEqual([0.1, 0.2, 0.3, 0.4, 0.5]);
    const v = axisValues({ lo: 0.07, hi: 0.93, n: 200 });
    expect(v[0]).toBe(0.07);
    expect(v[199]).toBe(0.93);
    expect(axisValues({ lo: 1, hi: 1, n: 1 })).toEqual([1]);
  });
});

describe('runSweep', () => {
  it('equals the decimal ledger (computeScenario) at random cells of a 200 × 200 sweep to 1e-6 relative', () => {
    const s = sixOptions();
    const result = runSweep(s, settings('led-wide'));
    const vary = s.options.findIndex((o) => o.id === 'led-wide');
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 199 }), fc.integer({ min: 0, max: 199 }), (t, e) => {
        const direct = computeScenario(withPriceAndFactor(s, result.tariffs[t]!, vary, result.efficacyFactors[e]!));
        for (const o of direct.options) {
          expect(relDiff(result.presentValue[o.id]![t]![e]!, Number(o.totalPresentValue))).toBeLessThan(1e-6);
        }
        expect(result.winner[t]![e]).toBe(direct.cheapest);
      }),
      { numRuns: 40 },
    );
  });

  it('agrees with the decimal ledger at random cells of random rooms, whole or exact counts', () => {
    fc.assert(
      fc.property(roomArb, fc.integer({ min: 0, max: 5 }), fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 9 }), (s, vary, t, e) => {
        const result = runSweep(s, { vary: s.options[vary]!.id, tariff: { lo: 0, hi: 0.9, n: 10 }, efficacy: { lo: 0.5, hi: 2, n: 10 } });
        const direct = computeScenario(withPriceAndFactor(s, result.tariffs[t]!, vary, result.efficacyFactors[e]!));
        for (const o of direct.options) expect(relDiff(result.presentValue[o.id]![t]![e]!, Number(o.totalPresentValue))).toBeLessThan(1e-6);
      }),
      { numRuns: 60 },
    );
  });

  it('names as winner the option with the lowest present value in every cell', () => {
    const r = runSweep(sixOptions(), settings('ceramic', 25));
    r.winner.forEach((row, t) =>
      row.forEach((id, e) => {
        const lowest = Math.min(...Object.values(r.presentValue).map((g) => g[t]![e]!));
        expect(r.presentValue[id]![t]![e]).toBe(lowest);
      }),
    );
  });

  it('gives the same result however the rows are split into chunks', () => {
    const s = sixOptions({ fixtureCount: 'whole' });
    const plan = planSweep(s, settings('led-ppf', 37));
    const whole = runSweep(s, settings('led-ppf', 37));
    const chunks = [sweepRows(plan, 30, 37), sweepRows(plan, 0, 1), sweepRows(plan, 1, 30)];
    expect(assembleSweep(plan, chunks)).toEqual(whole);
  });

  it('reports progress after each chunk, ending at the number of rows', () => {
    const seen: number[] = [];
    runSweep(sixOptions(), settings('tubes', 45), (done, total) => {
      expect(total).toBe(45);
      seen.push(done);
    }, 20);
    expect(seen).toEqual([20, 40, 45]);
  });

  it('never lets a higher multiplier raise the varied option’s present value, nor a higher price lower any (property)', () => {
    fc.assert(
      fc.property(roomArb, fc.integer({ min: 0, max: 5 }), (s, vary) => {
        const id = s.options[vary]!.id;
        const r = runSweep(s, { vary: id, tariff: { lo: 0, hi: 1, n: 12 }, efficacy: { lo: 0.4, hi: 2.1, n: 12 } });
        for (let t = 0; t < 12; t++) {
          for (let e = 0; e < 12; e++) {
            if (e > 0) expect(r.presentValue[id]![t]![e]!).toBeLessThanOrEqual(r.presentValue[id]![t]![e - 1]! * (1 + 1e-12));
            if (t > 0) for (const g of Object.values(r.presentValue)) expect(g[t]![e]!).toBeGreaterThanOrEqual(g[t - 1]![e]! * (1 - 1e-12));
          }
        }
      }),
      { numRuns: 80 },
    );
  });
});
