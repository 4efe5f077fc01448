import { as } from '../units';
import type { Ppfd } from '../units';
import { cctFromUv, uvFromXy } from './cct';
import { photonsFromWatts } from './photon';
import { MCCREE_KNOTS_NM, mccreeFieldYield, tristimulus } from './reference-curves';
import { integrate } from './spectrum-integrate';
import type { Spectrum } from './spectrum-parse';

/** The photon bands reported, nm, as ANSI/ASABE S640 names them; blue, green and red make up PAR. */
export const SPECTRUM_BANDS = {
  blue: [400, 500],
  green: [500, 600],
  red: [600, 700],
  farRed: [700, 800],
} as const satisfies Record<string, readonly [number, number]>;

/** Red window of the R:FR ratio, nm (Smith 1982). */
export const RED_WINDOW_NM = [655, 665] as const;
/** Far-red window of the R:FR ratio, nm (Smith 1982). */
export const FAR_RED_WINDOW_NM = [725, 735] as const;
/** The CIE 1931 chromaticity needs data from this wavelength or below, nm. */
export const CHROMATICITY_FROM_NM = 380;
/** The CIE 1931 chromaticity needs data up to this wavelength or beyond, nm. */
export const CHROMATICITY_TO_NM = 780;

/** The figures of a spectrum. */
export interface SpectrumSummary {
  /** PPFD over 400–700 nm, µmol m⁻² s⁻¹; null for relative input. */
  ppfd: Ppfd | null;
  /** Photon shares in %: blue, green, red of 400–700 nm (they add to 100), far-red 700–800 nm as % of 400–700 nm. */
  sharesPct: { blue: number; green: number; red: number; farRed: number };
  /** CIE 1931 2° chromaticity; null unless the data cover 380–780 nm. */
  cie1931: { x: number; y: number } | null;
  /** Correlated colour temperature, K (Ohno 2014); null without chromaticity, outside 1000–20000 K or with |Duv| > 0.05. */
  cctK: number | null;
  /** Distance from the Planckian locus in CIE 1960 (u, v), positive above it; null when cctK is null. */
  duv: number | null;
  /** Yield photon flux (McCree 1972 field mean, 350–725 nm within the data) / PPFD (400–700 nm). */
  ypfdRatio: number;
  /** Photons 655–665 nm / photons 725–735 nm (Smith 1982); null when the data do not cover both or far-red is 0. */
  redFarRedRatio: number | null;
  /** How many readings of the file were below zero and counted as 0 (instrument noise). */
  clampedReadings: number;
  /** Plain sentences about how the file was read, e.g. how many readings below zero were counted as 0. */
  notes: string[];
  /** Wavelengths of the data, nm, and the photon curve (µmol m⁻² s⁻¹ nm⁻¹, or relative) for a chart. */
  wavelengthNm: number[];
  photons: number[];
}

/** The spectrum as photons per nm: µmol m⁻² s⁻¹ nm⁻¹ for `w` and `umol`, relative photons for `relative`. */
export function photonCurve(s: Spectrum): number[] {
  return s.unit === 'umol' ? [...s.value] : s.value.map((v, i) => photonsFromWatts(v, s.wavelengthNm[i]!));
}

/** The spectrum as power per nm (W m⁻² nm⁻¹, or relative), the basis of colorimetry. */
function powerCurve(s: Spectrum, photons: number[]): readonly number[] {
  return s.unit === 'umol' ? photons.map((p, i) => p / photonsFromWatts(1, s.wavelengthNm[i]!)) : s.value;
}

function clampNotes(s: Spectrum): string[] {
  if (s.clampedReadings === 0) return [];
  const n = s.clampedReadings;
  const lowest = s.lowestReading === null ? '' : ` (the lowest was ${+s.lowestReading.toPrecision(4)})`;
  return [`${n} reading${n === 1 ? ' was' : 's were'} below zero${lowest} and ${n === 1 ? 'was' : 'were'} counted as 0, as instrument noise.`];
}

/**
 * Summarises a spectrum: PPFD and photon shares by band (integrals of the curve taken as linear
 * between samples, bands meeting at 500 and 600 nm splitting them exactly), CIE 1931 x, y and CCT,
 * the yield photon flux ratio and the red:far-red ratio. See src/engine/measurements/README.md.
 */
export function summariseSpectrum(s: Spectrum): SpectrumSummary {
  const nm = s.wavelengthNm;
  const photons = photonCurve(s);
  const band = ([a, b]: readonly [number, number]) => integrate(nm, photons, a, b);
  const blue = band(SPECTRUM_BANDS.blue);
  const green = band(SPECTRUM_BANDS.green);
  const red = band(SPECTRUM_BANDS.red);
  const par = blue + green + red;
  const pct = (q: number) => (q / par) * 100;

  const first = nm[0] ?? Number.POSITIVE_INFINITY;
  const last = nm[nm.length - 1] ?? Number.NEGATIVE_INFINITY;
  let cie1931: { x: number; y: number } | null = null;
  if (first <= CHROMATICITY_FROM_NM && last >= CHROMATICITY_TO_NM) {
    const [X, Y, Z] = tristimulus(nm, powerCurve(s, photons));
    if (X + Y + Z > 0) cie1931 = { x: X / (X + Y + Z), y: Y / (X + Y + Z) };
  }
  const cct = cie1931 ? cctFromUv(...uvFromXy(cie1931.x, cie1931.y)) : null;

  const ypf = integrate(nm, photons, 350, 725, mccreeFieldYield, MCCREE_KNOTS_NM);
  let redFarRedRatio: number | null = null;
  if (first <= RED_WINDOW_NM[0] && last >= FAR_RED_WINDOW_NM[1]) {
    const farRed = integrate(nm, photons, ...FAR_RED_WINDOW_NM);
    if (farRed > 0) redFarRedRatio = integrate(nm, photons, ...RED_WINDOW_NM) / farRed;
  }
  return {
    ppfd: s.unit === 'relative' ? null : as<Ppfd>(par),
    sharesPct: { blue: pct(blue), green: pct(green), red: pct(red), farRed: pct(band(SPECTRUM_BANDS.farRed)) },
    cie1931,
    cctK: cct?.cctK ?? null,
    duv: cct?.duv ?? null,
    ypfdRatio: ypf / par,
    redFarRedRatio,
    clampedReadings: s.clampedReadings,
    notes: clampNotes(s),
    wavelengthNm: [...nm],
    photons,
  };
}
