import { CIE_1931_2DEG_CMF } from './reference-data/cie-1931-2deg-cmf';
import { MCCREE_1972_RQY } from './reference-data/mccree-1972-relative-quantum-yield';

/** Wavelengths of McCree's table, nm; the yield curve bends only there. */
export const MCCREE_KNOTS_NM: readonly number[] = MCCREE_1972_RQY.fieldMean.map((_, i) => MCCREE_1972_RQY.startNm + i * MCCREE_1972_RQY.stepNm);

/**
 * McCree 1972 relative quantum yield, field mean (Table IV), at `nm`: linear between the 25 nm
 * points, 0 outside the tabulated 350–725 nm.
 */
export function mccreeFieldYield(nm: number): number {
  const t = (nm - MCCREE_1972_RQY.startNm) / MCCREE_1972_RQY.stepNm;
  const table = MCCREE_1972_RQY.fieldMean;
  if (t < 0 || t > table.length - 1) return 0;
  const i = Math.min(Math.floor(t), table.length - 2);
  const f = t - i;
  return table[i]! * (1 - f) + table[i + 1]! * f;
}

/**
 * Tristimulus sums X, Y, Z of a spectral power curve: Σ S(λ) x̄(λ) Δλ over the CIE table's 1 nm
 * points inside the sampled range, with S interpolated linearly onto those points.
 * @param nm ascending wavelengths of the curve, nm
 * @param power spectral power at those wavelengths (any energy unit per nm)
 */
export function tristimulus(nm: readonly number[], power: readonly number[]): [number, number, number] {
  const { startNm, xBar, yBar, zBar } = CIE_1931_2DEG_CMF;
  let X = 0;
  let Y = 0;
  let Z = 0;
  let j = 0;
  for (let k = 0; k < xBar.length; k++) {
    const at = startNm + k;
    while (j < nm.length && nm[j]! < at) j++;
    if (j >= nm.length) break;
    let s: number;
    if (nm[j] === at) s = power[j]!;
    else if (j === 0) continue;
    else s = power[j - 1]! + ((power[j]! - power[j - 1]!) * (at - nm[j - 1]!)) / (nm[j]! - nm[j - 1]!);
    X += s * xBar[k]!;
    Y += s * yBar[k]!;
    Z += s * zBar[k]!;
  }
  return [X, Y, Z];
}
