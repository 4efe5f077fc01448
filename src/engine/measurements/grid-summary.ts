import { as } from '../units';
import type { Fraction, MicromolePerJoule, MicromolePerSecond, Ppfd, SquareMetres, Watts } from '../units';
import type { PpfdGrid } from './grid-parse';

/** What a measured grid needs beside its readings to give canopy figures. */
export interface GridContext {
  /** Canopy area the grid covers, m². */
  areaM2?: SquareMetres;
  /** Electrical input of the lamps lighting it, W at the wall. */
  wallWatts?: Watts;
}

/** The figures of a PPFD grid. */
export interface PpfdGridSummary {
  rows: number;
  cols: number;
  count: number;
  /** µmol m⁻² s⁻¹ */
  mean: Ppfd;
  min: Ppfd;
  max: Ppfd;
  /** Uniformity min/mean and min/max, fractions (not %). */
  minOverMean: Fraction;
  minOverMax: Fraction;
  /** Coefficient of variation: population standard deviation (divides by n, not n − 1) / mean. */
  cv: Fraction;
  /** µmol/s = mean × area; null without an area. */
  canopyFlux: MicromolePerSecond | null;
  /** µmol/J = canopyFlux / wall watts; null without both. */
  efficacyAtCanopy: MicromolePerJoule | null;
  /** The readings, values[row][column], µmol m⁻² s⁻¹, with their positions when the file gave them (for a heat map). */
  cells: Ppfd[][];
  xM: number[] | null;
  yM: number[] | null;
}

/**
 * Summarises a PPFD grid: mean, min, max, uniformity, population CV; with an area (m²) the canopy
 * photon flux (µmol/s = mean PPFD × area), and with wall watts too the efficacy at the canopy
 * (µmol/J = flux / W), which counts only the photons that land on the measured area.
 */
export function summarisePpfdGrid(grid: PpfdGrid, context: GridContext = {}): PpfdGridSummary {
  const all = grid.values.flat();
  const count = all.length;
  let sum = 0;
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (const v of all) {
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const mean = sum / count;
  // two passes: the one-pass variance formula loses digits when readings are large and close together
  let squares = 0;
  for (const v of all) squares += (v - mean) ** 2;
  const sd = Math.sqrt(squares / count);
  const canopyFlux = context.areaM2 === undefined ? null : as<MicromolePerSecond>(mean * context.areaM2);
  const efficacy = canopyFlux === null || context.wallWatts === undefined ? null : as<MicromolePerJoule>(canopyFlux / context.wallWatts);
  return {
    rows: grid.rows,
    cols: grid.cols,
    count,
    mean: as<Ppfd>(mean),
    min: as<Ppfd>(min),
    max: as<Ppfd>(max),
    minOverMean: as<Fraction>(min / mean),
    minOverMax: as<Fraction>(min / max),
    cv: as<Fraction>(sd / mean),
    canopyFlux,
    efficacyAtCanopy: efficacy,
    cells: grid.values.map((r) => [...r]),
    xM: grid.xM,
    yM: grid.yM,
  };
}

/**
 * A fixture's photon efficacy (µmol/J at the wall) from its efficacy at the canopy (µmol/J, photons
 * landing on the measured area per wall joule) and the share of its photons that landed there
 * (a fraction in (0, 1]). A scenario multiplies a fixture's output by its own utilization, so a
 * figure measured at the canopy is turned back into the fixture's before it is used, or the light
 * lost to walls and aisles would be counted twice: η = η_canopy / share.
 */
export function fixtureEfficacyFromCanopy(efficacyAtCanopy: MicromolePerJoule, shareOnArea: Fraction): MicromolePerJoule {
  if (!(shareOnArea > 0 && shareOnArea <= 1)) throw new RangeError(`the share of photons on the measured area must be in (0, 1], not ${shareOnArea}`);
  return as<MicromolePerJoule>(efficacyAtCanopy / shareOnArea);
}
