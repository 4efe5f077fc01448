/**
 * Measurements: PPFD grids and spectra read from CSV text and turned into the figures the trade
 * uses. Parse (text → value or problems by line), then summarise; the documents are the CLI's and
 * the API's output formats.
 */
export { DEFAULT_MAX_BYTES, utf8ByteLength } from './csv-rows';
export type { FileChecked, FileProblem } from './file-problems';
export { parsePpfdGridCsv } from './grid-parse';
export type { PpfdGrid, ReadOptions } from './grid-parse';
export { fixtureEfficacyFromCanopy, summarisePpfdGrid } from './grid-summary';
export type { GridContext, PpfdGridSummary } from './grid-summary';
export { MAX_STEP_NM, REQUIRED_FROM_NM, REQUIRED_TO_NM, SPECTRUM_UNITS, parseSpectrumCsv } from './spectrum-parse';
export type { Spectrum, SpectrumUnit } from './spectrum-parse';
export { CHROMATICITY_FROM_NM, CHROMATICITY_TO_NM, FAR_RED_WINDOW_NM, RED_WINDOW_NM, SPECTRUM_BANDS, photonCurve, summariseSpectrum } from './spectrum-summary';
export type { SpectrumSummary } from './spectrum-summary';
export { bandPhotonFluxDensity } from './band-flux';
export { CCT_MAX_K, CCT_MIN_K, MAX_ABS_DUV, cctFromUv, planckianUv, uvFromXy } from './cct';
export type { Cct } from './cct';
export { AVOGADRO_NA, LIGHT_C, PLANCK_C2, PLANCK_H, photonsFromWatts, wattsFromPhotons } from './photon';
export { mccreeFieldYield, tristimulus } from './reference-curves';
export { GRID_FORMAT, SPECTRUM_FORMAT, gridDocument, spectrumDocument } from './documents';
export type { GridDocument, SpectrumDocument } from './documents';
export { readPpfdGrid, readSpectrum } from './read';
