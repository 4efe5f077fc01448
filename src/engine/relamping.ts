import { WHOLE_TOLERANCE } from './leveling';

/**
 * Lamp replacements per fixture in each year of the horizon. A set is replaced each time the lit
 * hours reach a multiple of the interval strictly before the horizon's end, so there are
 * ⌈H × N / interval⌉ − 1 of them, replacement k falling in year ⌈k × interval / H⌉.
 * @param litHoursPerYear H, h
 * @param horizonYears N, whole years
 * @param intervalHours planned relamping interval, lit hours
 * @returns counts[t] for t = 0..N (counts[0] is always 0)
 */
export function replacementsByYear(litHoursPerYear: number, horizonYears: number, intervalHours: number): number[] {
  const counts = new Array<number>(horizonYears + 1).fill(0);
  const total = Math.max(0, Math.ceil((litHoursPerYear * horizonYears) / intervalHours - WHOLE_TOLERANCE) - 1);
  for (let k = 1; k <= total; k++) {
    const year = Math.max(1, Math.ceil((k * intervalHours) / litHoursPerYear - WHOLE_TOLERANCE));
    counts[year] = (counts[year] ?? 0) + 1;
  }
  return counts;
}
