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
