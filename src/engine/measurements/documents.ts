import type { PpfdGridSummary } from './grid-summary';
import type { SpectrumSummary } from './spectrum-summary';

/** Format tag of a grid summary document, version 1 (/work/shared/spec/cli.md). */
export const GRID_FORMAT = 'photon-parity/grid@1';
/** Format tag of a spectrum summary document, version 1 (/work/shared/spec/cli.md). */
export const SPECTRUM_FORMAT = 'photon-parity/spectrum@1';

/** `photon-parity/grid@1`: PPFD figures in µmol m⁻² s⁻¹, ratios as fractions; the canopy fields only when known. */
export interface GridDocument {
  format: typeof GRID_FORMAT;
  rows: number;
  cols: number;
  count: number;
  mean: number;
  min: number;
  max: number;
  minOverMean: number;
  minOverMax: number;
  /** population standard deviation / mean */
  cv: number;
  /** µmol/s */
  canopyFlux?: number;
  /** µmol/J */
  efficacyAtCanopy?: number;
}

/** `photon-parity/spectrum@1`, exactly the fields of the spec. */
export interface SpectrumDocument {
  format: typeof SPECTRUM_FORMAT;
  ppfd: number | null;
  sharesPct: { blue: number; green: number; red: number; farRed: number };
  cie1931: { x: number; y: number } | null;
  cctK: number | null;
  ypfdRatio: number;
  redFarRedRatio: number | null;
}

/** The grid summary as the document the CLI prints and the API returns; no heat-map cells. */
export function gridDocument(s: PpfdGridSummary): GridDocument {
  return {
    format: GRID_FORMAT,
    rows: s.rows,
    cols: s.cols,
    count: s.count,
    mean: s.mean,
    min: s.min,
    max: s.max,
    minOverMean: s.minOverMean,
    minOverMax: s.minOverMax,
    cv: s.cv,
    ...(s.canopyFlux === null ? {} : { canopyFlux: s.canopyFlux }),
    ...(s.efficacyAtCanopy === null ? {} : { efficacyAtCanopy: s.efficacyAtCanopy }),
  };
}

/** The spectrum summary as the document the CLI prints and the API returns; no chart curve, no Duv. */
export function spectrumDocument(s: SpectrumSummary): SpectrumDocument {
  return {
    format: SPECTRUM_FORMAT,
    ppfd: s.ppfd,
    sharesPct: { ...s.sharesPct },
    cie1931: s.cie1931 ? { ...s.cie1931 } : null,
    cctK: s.cctK,
    ypfdRatio: s.ypfdRatio,
    redFarRedRatio: s.redFarRedRatio,
  };
}
