import { z } from 'zod';
import { gridDocument, spectrumDocument } from '../../../src/engine/measurements';
import type { PpfdGridSummary, SpectrumSummary } from '../../../src/engine/measurements';
import { gridDocumentSchema, measurementDataSchema, spectrumDocumentSchema } from '../../../src/contracts/api/measurements';

/**
 * What the `summary` column holds: the spec's document (grid@1 or spectrum@1), notes on how the
 * file was read, and the data to draw it (grid readings, photon curve).
 */
export const storedSummarySchema = z.object({
  grid: gridDocumentSchema.nullable(),
  spectrum: spectrumDocumentSchema.nullable(),
  notes: z.array(z.string()),
  data: measurementDataSchema,
});
export type StoredSummary = z.infer<typeof storedSummarySchema>;

/** The stored form of a grid's summary. */
export function storedGrid(s: PpfdGridSummary): StoredSummary {
  return {
    grid: gridDocument(s),
    spectrum: null,
    notes: [],
    data: { cells: s.cells.map((r) => [...r]), xM: s.xM, yM: s.yM, wavelengthNm: null, photons: null, duv: null },
  };
}

/** The stored form of a spectrum's summary. */
export function storedSpectrum(s: SpectrumSummary): StoredSummary {
  return {
    grid: null,
    spectrum: spectrumDocument(s),
    notes: [...s.notes],
    data: { cells: null, xM: null, yM: null, wavelengthNm: s.wavelengthNm, photons: s.photons, duv: s.duv },
  };
}

/** Reads the `summary` column back; it was written by this module, so a mismatch is a server fault. */
export function readStoredSummary(json: string): StoredSummary {
  return storedSummarySchema.parse(JSON.parse(json));
}
