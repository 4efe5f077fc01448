import { DEFAULT_MAX_BYTES, notANumber, numberCell, readCsvRows } from './csv-rows';
import { fileProblem, lineProblem, refused } from './file-problems';
import type { FileChecked, FileProblem } from './file-problems';
import type { ReadOptions } from './grid-parse';
import { integrate } from './spectrum-integrate';

/** Unit of a spectrum's values: W m⁻² nm⁻¹, µmol m⁻² s⁻¹ nm⁻¹, or relative spectral power (energy basis). */
export type SpectrumUnit = 'w' | 'umol' | 'relative';

/** Every accepted spectrum unit. */
export const SPECTRUM_UNITS: readonly SpectrumUnit[] = ['w', 'umol', 'relative'];

/** A measured spectrum: strictly ascending wavelengths (nm) with one value each in `unit`. */
export interface Spectrum {
  unit: SpectrumUnit;
  wavelengthNm: number[];
  /** Values in `unit`, 0 or more: readings below zero were counted as 0. */
  value: number[];
  /** How many readings were below zero in the file and were counted as 0. */
  clampedReadings: number;
  /** The lowest reading in the file when it was below zero, in `unit`; otherwise null. */
  lowestReading: number | null;
}

/** Largest gap between neighbouring wavelengths accepted, nm. */
export const MAX_STEP_NM = 10;
/**
 * Slack on MAX_STEP_NM, nm: the difference of two decimal wavelengths is not exact in binary floating
 * point (502.2 to 512.2 nm comes out as 10.000000000000057), and a file written in 10 nm steps must pass.
 */
const STEP_SLACK_NM = 1e-6;
/** A spectrum must start at or below this wavelength, nm (PAR). */
export const REQUIRED_FROM_NM = 400;
/** A spectrum must reach this wavelength or beyond, nm (PAR). */
export const REQUIRED_TO_NM = 700;

function checkWavelengths(lines: number[], nm: number[], problems: FileProblem[]): void {
  for (let i = 1; i < nm.length; i++) {
    const step = nm[i]! - nm[i - 1]!;
    if (step <= 0) problems.push(lineProblem(lines[i]!, `${nm[i]} nm does not follow ${nm[i - 1]} nm (line ${lines[i - 1]}); wavelengths must ascend`));
    else if (step > MAX_STEP_NM + STEP_SLACK_NM) {
      problems.push(lineProblem(lines[i]!, `a step of ${+step.toFixed(6)} nm from ${nm[i - 1]} nm (line ${lines[i - 1]}); steps must be at most ${MAX_STEP_NM} nm`));
    }
  }
  const first = nm[0];
  const last = nm[nm.length - 1];
  if (first !== undefined && first > REQUIRED_FROM_NM) {
    problems.push(lineProblem(lines[0]!, `the data start at ${first} nm; they must start at ${REQUIRED_FROM_NM} nm or below to cover ${REQUIRED_FROM_NM}–${REQUIRED_TO_NM} nm`));
  }
  if (last !== undefined && last < REQUIRED_TO_NM) {
    problems.push(lineProblem(lines[lines.length - 1]!, `the data stop at ${last} nm; they must reach ${REQUIRED_TO_NM} nm or beyond to cover ${REQUIRED_FROM_NM}–${REQUIRED_TO_NM} nm`));
  }
}

/**
 * Reads a spectrum from CSV text with a header line: the first column is the wavelength in nm
 * (strictly ascending, steps of at most 10 nm, covering 400–700 nm), the second the value in `unit`;
 * further columns are ignored but every row needs as many cells as the header. A reading below zero
 * (a spectroradiometer's dark noise) counts as 0 and is counted in `clampedReadings`.
 * Returns the spectrum or every problem found, each with its line.
 */
export function parseSpectrumCsv(text: string, unit: SpectrumUnit, options: ReadOptions = {}): FileChecked<Spectrum> {
  const read = readCsvRows(text, options.maxBytes ?? DEFAULT_MAX_BYTES);
  if (!read.ok) return read;
  const [header, ...rows] = read.value;
  if (!header) return refused([lineProblem(1, 'the file has no values')]);
  if (numberCell(header.cells[0] ?? '') !== null) {
    return refused([lineProblem(header.line, 'the header is missing: the first line must name the columns, e.g. "wavelength_nm,value"')]);
  }
  const problems: FileProblem[] = [];
  if (header.cells.length < 2) problems.push(lineProblem(header.line, `the header names ${header.cells.length} column; a spectrum needs wavelength and value`));
  if (rows.length < 2) problems.push(lineProblem(header.line, `${rows.length} reading${rows.length === 1 ? '' : 's'} follow the header; a spectrum needs at least 2`));
  const lines: number[] = [];
  const wavelengthNm: number[] = [];
  const value: number[] = [];
  let clampedReadings = 0;
  let lowestReading: number | null = null;
  for (const row of rows) {
    if (row.cells.length !== header.cells.length) {
      problems.push(lineProblem(row.line, `has ${row.cells.length} values; the header has ${header.cells.length}`));
      continue;
    }
    const nm = numberCell(row.cells[0] ?? '');
    const v = numberCell(row.cells[1] ?? '');
    if (nm === null) problems.push(lineProblem(row.line, notANumber(1, row.cells[0] ?? '')));
    else if (nm <= 0) problems.push(lineProblem(row.line, `column 1: ${nm} is not a wavelength; it must be greater than 0 nm`));
    if (v === null) problems.push(lineProblem(row.line, notANumber(2, row.cells[1] ?? '')));
    if (nm === null || nm <= 0 || v === null) continue;
    if (v < 0) {
      clampedReadings += 1;
      lowestReading = Math.min(lowestReading ?? 0, v);
    }
    lines.push(row.line);
    wavelengthNm.push(nm);
    value.push(Math.max(0, v));
  }
  if (problems.length === 0) checkWavelengths(lines, wavelengthNm, problems);
  if (problems.length === 0 && !(integrate(wavelengthNm, value, REQUIRED_FROM_NM, REQUIRED_TO_NM) > 0)) {
    problems.push(fileProblem(`every value over ${REQUIRED_FROM_NM}–${REQUIRED_TO_NM} nm is 0; there is no light to summarise`));
  }
  return problems.length > 0 ? refused(problems) : { ok: true, value: { unit, wavelengthNm, value, clampedReadings, lowestReading } };
}
