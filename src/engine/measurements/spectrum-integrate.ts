/**
 * Integration of a sampled curve, treated as linear between its samples (no extrapolation).
 * Integrating [a, b] and [b, c] gives exactly the pieces of [a, c], so bands that meet at an edge
 * split it without gap or overlap: a sample on the edge counts half to each side, as in the
 * trapezoid rule, and an edge between samples takes the linearly interpolated value.
 */

/** Index of the first sample at or after `nm` (binary search over ascending wavelengths). */
export function firstAtOrAfter(nm: readonly number[], at: number): number {
  let lo = 0;
  let hi = nm.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (nm[mid]! < at) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The curve's value at `at` nm by linear interpolation; 0 outside the sampled range. */
export function valueAt(nm: readonly number[], y: readonly number[], at: number): number {
  const i = firstAtOrAfter(nm, at);
  if (i >= nm.length) return 0;
  if (nm[i] === at) return y[i]!;
  if (i === 0) return 0;
  const x0 = nm[i - 1]!;
  const x1 = nm[i]!;
  return y[i - 1]! + ((y[i]! - y[i - 1]!) * (at - x0)) / (x1 - x0);
}

/**
 * ∫ y(λ) · weight(λ) dλ over [from, to] ∩ the sampled range, by the trapezoid rule on the samples,
 * the two ends, and any extra knots of the weight (where the weight itself bends).
 * @param nm ascending wavelengths, nm
 * @param y the curve at those wavelengths, per nm
 * @returns the integral in the curve's unit (times the weight's)
 */
export function integrate(
  nm: readonly number[],
  y: readonly number[],
  from: number,
  to: number,
  weight?: (at: number) => number,
  weightKnots: readonly number[] = [],
): number {
  const a = Math.max(from, nm[0] ?? Number.POSITIVE_INFINITY);
  const b = Math.min(to, nm[nm.length - 1] ?? Number.NEGATIVE_INFINITY);
  if (!(b > a)) return 0;
  const w = weight ?? (() => 1);
  const knots = weightKnots.filter((k) => k > a && k < b);
  let k = 0;
  let prevX = a;
  let prevG = valueAt(nm, y, a) * w(a);
  let sum = 0;
  const step = (x: number, yx: number) => {
    const g = yx * w(x);
    sum += ((x - prevX) * (prevG + g)) / 2;
    prevX = x;
    prevG = g;
  };
  for (let i = firstAtOrAfter(nm, a); i < nm.length && nm[i]! < b; i++) {
    const x = nm[i]!;
    while (k < knots.length && knots[k]! < x) step(knots[k]!, valueAt(nm, y, knots[k++]!));
    if (x > a) step(x, y[i]!);
  }
  while (k < knots.length) step(knots[k]!, valueAt(nm, y, knots[k++]!));
  step(b, valueAt(nm, y, b));
  return sum;
}
