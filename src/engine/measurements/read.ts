import type { FileChecked } from './file-problems';
import { parsePpfdGridCsv } from './grid-parse';
import type { ReadOptions } from './grid-parse';
import { summarisePpfdGrid } from './grid-summary';
import type { GridContext, PpfdGridSummary } from './grid-summary';
import { parseSpectrumCsv } from './spectrum-parse';
import type { SpectrumUnit } from './spectrum-parse';
import { summariseSpectrum } from './spectrum-summary';
import type { SpectrumSummary } from './spectrum-summary';

/** CSV text of a PPFD grid → its summary (area m², wall watts W optional), or every problem by line. */
export function readPpfdGrid(text: string, context: GridContext = {}, options: ReadOptions = {}): FileChecked<PpfdGridSummary> {
  const parsed = parsePpfdGridCsv(text, options);
  return parsed.ok ? { ok: true, value: summarisePpfdGrid(parsed.value, context) } : parsed;
}

/** CSV text of a spectrum in `unit` → its summary, or every problem by line. */
export function readSpectrum(text: string, unit: SpectrumUnit, options: ReadOptions = {}): FileChecked<SpectrumSummary> {
  const parsed = parseSpectrumCsv(text, unit, options);
  return parsed.ok ? { ok: true, value: summariseSpectrum(parsed.value) } : parsed;
}
