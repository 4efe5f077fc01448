import { describe, expect, it } from 'vitest';
import type { UncertaintySettings } from '../../src/contracts/sensitivity';
import { uncertaintySettingsSchema } from '../../src/contracts/sensitivity';
import { check } from '../../src/contracts/problems';
import {
  checkUncertaintySettings, computeScenario, planUncertainty, runUncertainty, seedXoshiro128, summarizeUncertainty,
  triangularQuantile, uncertaintyDraws, unitInterval, xoshiro128ssNext,
} from '../../src/engine';
import { pathKeysForTest, relDiff, sixOptions } from './fixtures';

const settings = (seed: number, draws = 10_000): UncertaintySettings => ({
  seed,
  draws,
  inputs: [
    { path: 'electricity.pricePerKwh', low: 0.12, likely: 0.24, high: 0.45 },
    { path: 'electricity.escalationPctPerYear', low: 0, likely: 2.5, high: 6 },
    { path: 'options[3].photonEfficacy', low: 2.2, likely: 2.7, high: 3.0 },
    { path: 'options[1].fixturePrice', low: 300, likely: 395, high: 520 },
    { path: 'utilization', low: 0.75, likely: 0.86, high: 0.95 },
    { path: 'cooling.cop', low: 2.4, likely: 3.1, high: 4 },
  ],
});

describe('runUncertainty', () => {
  it('gives identical results for identical seeds and different results for different seeds', () => {
    const s = sixOptions();
    const a = runUncertainty(s, settings(7));
    expect(runUncertainty(s, settings(7))).toEqual(a);
    const b = runUncertainty(s, settings(8));
    expect(b.options.map((o) => o.p50)).not.toEqual(a.options.map((o) => o.p50));
  });

  it('gives chances that add up to 1 and ordered quantiles for every option', () => {
    const r = runUncertainty(sixOptions(), settings(11));
    expect(r.options.reduce((sum, o) => sum + o.chanceCheapest, 0)).toBeCloseTo(1, 12);
    for (const o of r.options) {
      expect(o.p10).toBeLessThanOrEqual(o.p50);
      expect(o.p50).toBeLessThanOrEqual(o.p90);
    }
    expect(r.quantileDefinition).toBe('hyndman-fan-7');
  });

  it('gives the same numbers however the draws are split into chunks, in any order', () => {
    const s = sixOptions();
    const plan = planUncertainty(s, settings(5, 1000));
    const chunks = [uncertaintyDraws(plan, 700, 1000), uncertaintyDraws(plan, 0, 333), uncertaintyDraws(plan, 333, 700)];
    expect(summarizeUncertainty(plan, chunks)).toEqual(runUncertainty(s, settings(5, 1000), undefined, 250));
  });

  it('prices each draw like the decimal ledger (computeScenario) to 1e-6 relative', () => {
    const s = sixOptions();
    const st = settings(99, 12);
    const chunk = uncertaintyDraws(planUncertainty(s, st), 0, 12);
    const gen = seedXoshiro128(99);
    for (let k = 0; k < 12; k++) {
      let drawn = s;
      for (const r of st.inputs) {
        const v = triangularQuantile(unitInterval(xoshiro128ssNext(gen)), r.low, r.likely, r.high);
        const money = r.path === 'electricity.pricePerKwh' || r.path.endsWith('Price');
        drawn = pathKeysForTest(drawn, r.path, money ? String(v) : v);
      }
      computeScenario(drawn).options.forEach((o, i) => expect(relDiff(chunk.presentValue[i]![k]!, Number(o.totalPresentValue))).toBeLessThan(1e-6));
    }
  });

  it('gives the sure winner a chance of 1 when only a narrow price range is drawn', () => {
    const s = sixOptions();
    const cheapest = computeScenario(s).cheapest;
    const r = runUncertainty(s, { seed: 3, draws: 2000, inputs: [{ path: 'electricity.pricePerKwh', low: 0.239, likely: 0.24, high: 0.241 }] });
    expect(r.options.find((o) => o.id === cheapest)!.chanceCheapest).toBe(1);
  });
});

describe('uncertainty settings', () => {
  it('refuses ranges out of order, repeated paths and seeds out of range, one problem per line', () => {
    const bad = check(uncertaintySettingsSchema, {
      seed: -1,
      inputs: [{ path: 'utilization', low: 0.9, likely: 0.8, high: 0.7 }, { path: 'utilization', low: 0.5, likely: 0.6, high: 0.7 }],
    });
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.problems).toEqual([
        { path: 'seed', message: 'must be at least 0' },
        { path: 'inputs[0].likely', message: 'must be at least low (0.9)' },
        { path: 'inputs[0].high', message: 'must be at least likely (0.8)' },
        { path: 'inputs[1].path', message: 'repeats "utilization"; each input is drawn once' },
      ]);
    }
    const ok = check(uncertaintySettingsSchema, { seed: 1, inputs: [{ path: 'utilization', low: 0.5, likely: 0.6, high: 0.7 }] });
    expect(ok.ok && ok.value.draws).toBe(10_000);
  });

  it('refuses against the scenario an unknown path, the horizon, a value out of range and days beyond a year', () => {
    const problems = checkUncertaintySettings(sixOptions(), {
      seed: 1,
      draws: 10,
      inputs: [
        { path: 'options[0].spectrum.bluePct', low: 1, likely: 2, high: 3 },
        { path: 'horizonYears', low: 5, likely: 10, high: 12 },
        { path: 'utilization', low: 0.8, likely: 0.9, high: 1.1 },
        { path: 'schedule[1].daysPerYear', low: 250, likely: 280, high: 320 },
      ],
    });
    expect(problems.map((p) => p.path)).toEqual(['inputs[0].path', 'inputs[1].path', 'inputs[2].high', 'inputs[3].high', 'inputs']);
  });
});
