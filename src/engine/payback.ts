import { dec } from './money';
import type { Decimal } from './money';

/**
 * Years until an option's cumulative nominal cost is at or below the baseline's, interpolated
 * linearly inside the year it crosses: 0 when already at or below at year 0, null when it never
 * gets there within the horizon.
 * @param option cumulative cost by year 0..N
 * @param baseline cumulative cost by year 0..N
 * @returns years (fractional), or null
 */
export function paybackYears(option: readonly Decimal[], baseline: readonly Decimal[]): number | null {
  const gap = (t: number): Decimal | undefined => {
    const a = option[t];
    const b = baseline[t];
    return a && b ? a.minus(b) : undefined;
  };
  const first = gap(0);
  if (!first) return null;
  if (first.lte(0)) return 0;
  let previous = first;
  for (let t = 1; t < option.length; t++) {
    const current = gap(t);
    if (!current) return null;
    if (current.lte(0)) {
      // The gap shrinks linearly inside year t; it reaches 0 after previous / (previous − current) of the year.
      return t - 1 + previous.div(previous.minus(current)).toNumber();
    }
    previous = current;
  }
  return null;
}

/**
 * Cumulative cost at a fractional year, read linearly between the yearly figures (the same straight
 * line paybackYears interpolates on), so the point at an option's payback year lies on its curve.
 * @param cumulative cumulative cost by year 0..N, currency
 * @param year years from the start, 0..N (clamped to that range)
 * @returns currency, as a decimal; 0 for an empty series
 */
export function cumulativeAt(cumulative: readonly (Decimal | string)[], year: number): Decimal {
  const last = cumulative.length - 1;
  if (last < 0) return dec(0);
  const t = Math.min(Math.max(year, 0), last);
  const y0 = Math.floor(t);
  const a = dec(cumulative[y0]!);
  if (y0 === last) return a;
  const b = dec(cumulative[y0 + 1]!);
  return a.plus(b.minus(a).times(t - y0));
}
