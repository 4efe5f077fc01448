import { PLANCK_C2 } from './photon';
import { CIE_1931_2DEG_CMF } from './reference-data/cie-1931-2deg-cmf';

/** A correlated colour temperature, K, and the signed distance Duv from the Planckian locus in CIE 1960 (u, v). */
export interface Cct {
  cctK: number;
  duv: number;
}

/** Lowest CCT given, K (the Planckian table starts here). */
export const CCT_MIN_K = 1000;
/** Highest CCT given, K (the Planckian table ends here). */
export const CCT_MAX_K = 20000;
/** Farthest from the Planckian locus a CCT is still given (CIE 15: |Duv| ≤ 0.05). */
export const MAX_ABS_DUV = 0.05;

/** CIE 1960 (u, v) of a Planckian radiator at `kelvin`, from the CIE 1931 2° table at 1 nm and c2 = 1.4388e-2 m·K. */
export function planckianUv(kelvin: number): [number, number] {
  const { startNm, xBar, yBar, zBar } = CIE_1931_2DEG_CMF;
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let k = 0; k < xBar.length; k++) {
    const um = (startNm + k) * 1e-3;
    // Planck's law up to a constant factor; λ in µm keeps the numbers in range
    const m = 1 / (um ** 5 * Math.expm1(PLANCK_C2 / (um * 1e-6 * kelvin)));
    X += m * xBar[k]!;
    Y += m * yBar[k]!;
    Z += m * zBar[k]!;
  }
  const d = X + 15 * Y + 3 * Z;
  return [(4 * X) / d, (6 * Y) / d];
}

interface Row {
  t: number;
  u: number;
  v: number;
  d: number;
}

let coarse: { t: number; u: number; v: number }[] | null = null;

/** The first table: 5 % steps over 1000–20000 K, built once on first use; the cascade refines it. */
function coarseTable() {
  if (!coarse) {
    coarse = [];
    for (let t = CCT_MIN_K; t <= CCT_MAX_K * 1.0001; t *= 1.05) {
      const [u, v] = planckianUv(t);
      coarse.push({ t, u, v });
    }
  }
  return coarse;
}

function nearest(rows: Row[]): number {
  let best = 0;
  rows.forEach((r, i) => r.d < rows[best]!.d && (best = i));
  return best;
}

const withDistance = (u: number, v: number) => (p: { t: number; u: number; v: number }): Row => ({ ...p, d: Math.hypot(u - p.u, v - p.v) });

/** Ohno (2014) triangular solution on three neighbouring table rows. */
function triangular(v: number, [p, , n]: Row[]): Cct {
  const l = Math.hypot(n!.u - p!.u, n!.v - p!.v);
  const x = (p!.d ** 2 - n!.d ** 2 + l ** 2) / (2 * l);
  const cctK = p!.t + ((n!.t - p!.t) * x) / l;
  const vx = p!.v + ((n!.v - p!.v) * x) / l;
  return { cctK, duv: Math.sqrt(Math.max(0, p!.d ** 2 - x ** 2)) * Math.sign(v - vx) };
}

/** Ohno (2014) parabolic solution on three neighbouring table rows. */
function parabolic(v: number, [p, m, n]: Row[]): Cct {
  const X = (n!.t - m!.t) * (p!.t - n!.t) * (m!.t - p!.t);
  const a = (p!.t * (n!.d - m!.d) + m!.t * (p!.d - n!.d) + n!.t * (m!.d - p!.d)) / X;
  const b = -(p!.t ** 2 * (n!.d - m!.d) + m!.t ** 2 * (p!.d - n!.d) + n!.t ** 2 * (m!.d - p!.d)) / X;
  const c = -(p!.d * (n!.t - m!.t) * m!.t * n!.t + m!.d * (p!.t - n!.t) * p!.t * n!.t + n!.d * (m!.t - p!.t) * p!.t * m!.t) / X;
  const cctK = -b / (2 * a);
  return { cctK, duv: (a * cctK ** 2 + b * cctK + c) * Math.sign(v - planckianUv(cctK)[1]) };
}

/**
 * Correlated colour temperature of a CIE 1960 (u, v) chromaticity by Ohno (2014), "Practical use
 * and calculation of CCT and Duv", LEUKOS 10(1): 47–55: the nearest point of a 5 % Planckian table,
 * refined by four cascades of finer tables (Ohno's cascade expansion; steps of 0.0016 % at the end,
 * 0.03 K at 2000 K), then the triangular solution
 * near the locus (|Duv| < 0.002) and the parabolic one farther off. Holds from 1000 to 20000 K,
 * sodium-lamp temperatures included.
 * @returns CCT in K and Duv, or null outside 1000–20000 K or with |Duv| > 0.05
 */
export function cctFromUv(u: number, v: number): Cct | null {
  const table = coarseTable().map(withDistance(u, v));
  let i = nearest(table);
  if (i === 0 || i === table.length - 1) return null;
  let rows = table.slice(i - 1, i + 2);
  for (let pass = 0; pass < 4; pass++) {
    const lo = rows[0]!.t;
    const ratio = (rows[2]!.t / lo) ** (1 / 10);
    const fine = Array.from({ length: 11 }, (_, k) => {
      const t = lo * ratio ** k;
      const [pu, pv] = planckianUv(t);
      return withDistance(u, v)({ t, u: pu, v: pv });
    });
    i = Math.min(Math.max(nearest(fine), 1), fine.length - 2);
    rows = fine.slice(i - 1, i + 2);
  }
  const tri = triangular(v, rows);
  const result = Math.abs(tri.duv) < 0.002 ? tri : parabolic(v, rows);
  return Math.abs(result.duv) > MAX_ABS_DUV ? null : result;
}

/** CIE 1960 (u, v) from CIE 1931 (x, y): u = 4x / (−2x + 12y + 3), v = 6y / (−2x + 12y + 3). */
export function uvFromXy(x: number, y: number): [number, number] {
  const d = -2 * x + 12 * y + 3;
  return [(4 * x) / d, (6 * y) / d];
}
