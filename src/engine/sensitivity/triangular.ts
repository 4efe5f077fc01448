/**
 * Inverse distribution function of the triangular distribution with minimum a, mode c and maximum
 * b (a ≤ c ≤ b): F⁻¹(u) = a + √(u (b − a)(c − a)) for u < (c − a)/(b − a), else
 * b − √((1 − u)(b − a)(b − c)). See M. Evans, N. Hastings and B. Peacock, Statistical
 * Distributions, 3rd ed. (Wiley, 2000), chapter "Triangular distribution".
 * @param u uniform number in (0, 1)
 * @returns a value in [a, b], in the units of a, c and b
 */
export function triangularQuantile(u: number, a: number, c: number, b: number): number {
  const width = b - a;
  if (width <= 0) return a;
  if (u * width < c - a) return a + Math.sqrt(u * width * (c - a));
  return b - Math.sqrt((1 - u) * width * (b - c));
}

/** Mean of the triangular distribution, (a + b + c) / 3 (Evans, Hastings and Peacock, as above). */
export function triangularMean(a: number, c: number, b: number): number {
  return (a + b + c) / 3;
}
