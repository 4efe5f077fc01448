import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cumulativeAt, dec, paybackYears } from '../../src/engine';
import type { Decimal } from '../../src/engine';

const d = (xs: number[]): Decimal[] => xs.map((x) => dec(x));

describe('cumulativeAt', () => {
  it('reads whole years as given and fractional years on the straight line between them', () => {
    const c = d([100, 140, 160]);
    expect(cumulativeAt(c, 1).toString()).toBe('140');
    expect(cumulativeAt(c, 1.5).toString()).toBe('150');
    expect(cumulativeAt(c, 2).toString()).toBe('160');
  });

  it('keeps money in decimals: 0.1 of the way from 0.1 to 0.3 is exactly 0.12', () => {
    expect(cumulativeAt(['0.1', '0.3'], 0.1).toString()).toBe('0.12');
  });

  it('clamps to the horizon and gives 0 for an empty series', () => {
    expect(cumulativeAt(d([5, 7]), 9).toString()).toBe('7');
    expect(cumulativeAt(d([5, 7]), -1).toString()).toBe('5');
    expect(cumulativeAt([], 1).toString()).toBe('0');
  });

  it('puts a payback after year 0 on both curves: there the option and the baseline cost the same', () => {
    const series = fc.array(fc.integer({ min: 0, max: 10_000 }), { minLength: 2, maxLength: 12 });
    fc.assert(
      fc.property(series, series, (a, b) => {
        const n = Math.min(a.length, b.length);
        const option = d(a.slice(0, n));
        const baseline = d(b.slice(0, n));
        const t = paybackYears(option, baseline);
        if (t === null || t === 0) return true;
        const gap = cumulativeAt(option, t).minus(cumulativeAt(baseline, t)).abs();
        return gap.lte(dec(1e-9).times(largestMagnitude(option, baseline)));
      }),
    );
  });
});

function largestMagnitude(...series: Decimal[][]): number {
  return Math.max(1, ...series.flat().map((x) => x.abs().toNumber()));
}
