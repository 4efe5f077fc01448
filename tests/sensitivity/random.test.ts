import { describe, expect, it } from 'vitest';
import { quantileSorted, seedXoshiro128, splitMix64, triangularMean, triangularQuantile, unitInterval, xoshiro128ssNext } from '../../src/engine';

describe('splitMix64', () => {
  it('reproduces the reference splitmix64.c outputs for seed 1477776061723855037 (published in the rand_xoshiro crate tests)', () => {
    expect(splitMix64(1477776061723855037n, 4)).toEqual([1985237415132408290n, 2979275885539914483n, 13511426838097143398n, 8488337342461049707n]);
  });
});

describe('xoshiro128ssNext', () => {
  it('reproduces outputs and states of the reference C implementation (Blackman and Vigna; test data of edorfaus/xoshiro-6502)', () => {
    const s = Uint32Array.from([0x964d4a0c, 0xd40ab895, 0xad7fdecb, 0x3006f0f0]);
    const outputs = [0xf1391922, 0x6fe53806, 0xa5be2840, 0xf510ee70].map(() => xoshiro128ssNext(s));
    expect(outputs).toEqual([0xf1391922, 0x6fe53806, 0xa5be2840, 0xf510ee70]);
    expect([...s]).toEqual([0xfc65379c, 0x52006d70, 0x87487639, 0xf1908343]);
  });

  it('gives the same stream for the same seed and a different one for another seed', () => {
    const take = (seed: number) => {
      const s = seedXoshiro128(seed);
      return Array.from({ length: 8 }, () => xoshiro128ssNext(s));
    };
    expect(take(42)).toEqual(take(42));
    expect(take(42)).not.toEqual(take(43));
  });
});

describe('triangularQuantile', () => {
  // Mean (a + b + c) / 3 and variance (a² + b² + c² − ab − ac − bc) / 18: M. Evans, N. Hastings and
  // B. Peacock, Statistical Distributions, 3rd ed. (Wiley, 2000), triangular distribution.
  it.each([
    [0.8, 1, 1.5],
    [0.1, 0.1, 0.4],
    [2, 3.5, 3.5],
  ])('matches the analytic mean and variance of triangular(%f, %f, %f) over 200,000 seeded draws', (a, c, b) => {
    const s = seedXoshiro128(20240611);
    const n = 200_000;
    let sum = 0;
    let sumSq = 0;
    let lowest = Infinity;
    let highest = -Infinity;
    for (let k = 0; k < n; k++) {
      const x = triangularQuantile(unitInterval(xoshiro128ssNext(s)), a, c, b);
      lowest = Math.min(lowest, x);
      highest = Math.max(highest, x);
      sum += x;
      sumSq += x * x;
    }
    expect(lowest).toBeGreaterThanOrEqual(a);
    expect(highest).toBeLessThanOrEqual(b);
    const mean = sum / n;
    const variance = sumSq / n - mean * mean;
    const expectedVar = (a * a + b * b + c * c - a * b - a * c - b * c) / 18;
    expect(triangularMean(a, c, b)).toBe((a + b + c) / 3);
    expect(Math.abs(mean - (a + b + c) / 3)).toBeLessThan(5 * Math.sqrt(expectedVar / n));
    expect(Math.abs(variance / expectedVar - 1)).toBeLessThan(0.02);
  });

  it('returns the low value for a range of zero width', () => {
    expect(triangularQuantile(0.3, 2, 2, 2)).toBe(2);
  });
});

describe('quantileSorted', () => {
  it('follows definition 7 of Hyndman and Fan (1996): for 1…10, P10 = 1.9, P50 = 5.5, P90 = 9.1 (worked from the definition)', () => {
    const xs = Array.from({ length: 10 }, (_, i) => i + 1);
    expect(quantileSorted(xs, 0.1)).toBeCloseTo(1.9, 12);
    expect(quantileSorted(xs, 0.5)).toBeCloseTo(5.5, 12);
    expect(quantileSorted(xs, 0.9)).toBeCloseTo(9.1, 12);
    expect(quantileSorted([7], 0.9)).toBe(7);
  });
});
