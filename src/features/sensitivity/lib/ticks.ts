/**
 * Round tick values from lo to hi: steps of 1, 2 or 5 times a power of ten, about `count` of them
 * (the usual choice for chart axes; common practice).
 */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step - 1e-9) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

/** Decimals that tell ticks apart: enough for their step, and no more. */
export function tickDecimals(ticks: readonly number[]): number {
  if (ticks.length < 2) return 2;
  const step = Math.abs(ticks[1]! - ticks[0]!);
  return Math.max(0, Math.min(6, -Math.floor(Math.log10(step) + 1e-9)));
}

/** Position 0 … 1 of a value along an axis of n evenly spaced cells centred on lo … hi. */
export function cellFraction(value: number, lo: number, hi: number, n: number): number {
  if (n <= 1 || hi === lo) return 0.5;
  return (((value - lo) / (hi - lo)) * (n - 1) + 0.5) / n;
}
