/**
 * Sample quantile by linear interpolation between order statistics: definition 7 of R. J. Hyndman
 * and Y. Fan, "Sample quantiles in statistical packages", The American Statistician 50(4), 1996
 * (h = (n − 1) p; the default of R and of NumPy).
 * @param sorted values in ascending order, at least one
 * @param p probability in [0, 1]
 * @returns the p-quantile, in the units of the values
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError('quantile of no values');
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const x0 = sorted[lo]!;
  if (lo + 1 >= n) return x0;
  return x0 + (h - lo) * (sorted[lo + 1]! - x0);
}
