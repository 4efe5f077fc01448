/**
 * Bisection on a monotone predicate: the boundary between lo, where `holds` is false, and hi, where
 * it is true. Works for continuous functions (holds = f ≤ 0 finds a root) and for step functions,
 * where it finds the step.
 * @returns the final bracket [below, above]: holds(above) is true and holds(below) false
 */
export function bisectBoundary(
  holds: (x: number) => boolean,
  lo: number,
  hi: number,
  relTolerance = 1e-14,
  maxIterations = 200,
): [number, number] {
  let below = lo;
  let above = hi;
  for (let k = 0; k < maxIterations; k++) {
    const mid = below + (above - below) / 2;
    if (mid <= below || mid >= above) break;
    if (holds(mid)) above = mid;
    else below = mid;
    if (above - below <= relTolerance * Math.max(1, Math.abs(above))) break;
  }
  return [below, above];
}

/**
 * Root of a continuous function with a sign change on [lo, hi], by bisection on its sign.
 * @returns the root, or null when f(lo) and f(hi) have the same strict sign
 */
export function bracketedRoot(f: (x: number) => number, lo: number, hi: number): number | null {
  const fl = f(lo);
  const fh = f(hi);
  if (fl === 0) return lo;
  if (fh === 0) return hi;
  if (Math.sign(fl) === Math.sign(fh)) return null;
  const rising = fh > 0;
  const [below, above] = bisectBoundary((x) => (rising ? f(x) >= 0 : f(x) <= 0), lo, hi);
  return below + (above - below) / 2;
}
