import { describe, expect, it } from 'vitest';
import { Decimal, computeScenario, paybackYears } from '../../src/engine';
import { baseInput, hpsOption, ledOption, scenario } from '../support/scenarios';

const d = (xs: number[]) => xs.map((x) => new Decimal(x));

describe('payback', () => {
  it('interpolates linearly inside the year the cumulative costs cross', () => {
    // gap 100 at year 0, 40 at year 1, −20 at year 2 → 1 + 40 / 60
    expect(paybackYears(d([100, 140, 160]), d([0, 100, 180]))).toBeCloseTo(1 + 40 / 60, 12);
  });

  it('is 0 when the option costs no more than the baseline at year 0', () => {
    expect(paybackYears(d([0, 10]), d([0, 20]))).toBe(0);
  });

  it('counts a crossing exactly at a year end as that year', () => {
    expect(paybackYears(d([100, 150, 200]), d([0, 100, 200]))).toBe(2);
  });

  it('is null when the option never catches up within the horizon', () => {
    expect(paybackYears(d([100, 200, 300]), d([0, 50, 100]))).toBeNull();
  });

  it('is null for the baseline itself, and measured against the baseline for the others', () => {
    const r = computeScenario(
      scenario(baseInput({ baseline: 'hps', options: [hpsOption({ owned: true, fixturePrice: undefined }), ledOption()] })),
    );
    expect(r.options[0]!.paybackYears).toBeNull();
    const led = r.options[1]!;
    const base = r.options[0]!;
    const t = led.paybackYears!;
    expect(t).toBeGreaterThan(0);
    const year = Math.ceil(t);
    // cumulative cost lines cross at t: interpolate both inside that year and compare
    const at = (o: typeof led) => {
      const a = Number(o.years[year - 1]!.cumulative);
      const b = Number(o.years[year]!.cumulative);
      return a + (b - a) * (t - (year - 1));
    };
    expect(at(led)).toBeCloseTo(at(base), 6);
  });
});
