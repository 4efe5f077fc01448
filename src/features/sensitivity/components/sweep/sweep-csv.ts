import type { SweepResult } from '../../../../engine/sensitivity/sweep';

/**
 * The whole grid as CSV (RFC 4180 line endings): one line per cell with the price, the multiplier,
 * the cheapest option's id and every option's present value. Ids are letters, digits and dashes, so
 * nothing needs quoting.
 */
export function sweepCsv(r: SweepResult): string {
  const ids = Object.keys(r.presentValue);
  const lines = [['price_per_kwh', 'efficacy_multiplier', 'cheapest', ...ids.map((id) => `present_value_${id}`)].join(',')];
  r.tariffs.forEach((price, t) => {
    r.efficacyFactors.forEach((factor, e) => {
      lines.push([price, factor, r.winner[t]![e]!, ...ids.map((id) => r.presentValue[id]![t]![e]!)].join(','));
    });
  });
  return `${lines.join('\r\n')}\r\n`;
}

/** Up to n indices spread evenly over 0 … length − 1, always including both ends. */
export function spreadIndices(length: number, n: number): number[] {
  if (length <= n) return Array.from({ length }, (_, i) => i);
  return Array.from({ length: n }, (_, i) => Math.round((i * (length - 1)) / (n - 1)));
}

/** Share of the grid's cells each option wins, 0 … 1. */
export function winShares(r: SweepResult): Map<string, number> {
  const counts = new Map<string, number>();
  let total = 0;
  for (const row of r.winner) {
    for (const id of row) {
      counts.set(id, (counts.get(id) ?? 0) + 1);
      total += 1;
    }
  }
  return new Map([...counts].map(([id, c]) => [id, c / total]));
}
