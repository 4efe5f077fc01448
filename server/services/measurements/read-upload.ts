import { readPpfdGrid, readSpectrum } from '../../../src/engine/measurements';
import { as } from '../../../src/engine/units';
import type { SquareMetres, Watts } from '../../../src/engine/units';
import type { FileProblem } from '../../../src/engine/measurements';
import { MEASUREMENT_FILE_LIMIT, measurementKindSchema, spectrumUnitSchema, uploadMeasurementFieldsSchema } from '../../../src/contracts/api/measurements';
import type { UploadMeasurementFields } from '../../../src/contracts/api/measurements';
import { check } from '../../../src/contracts/problems';
import type { Problem } from '../../../src/contracts/problems';
import { AppError } from '../../http/app-error';
import { storedGrid, storedSpectrum } from './stored-summary';
import type { StoredSummary } from './stored-summary';

/** An uploaded file as multer hands it over. */
export interface UploadedFile {
  originalname: string;
  mimetype: string;
  buffer: Buffer;
}

/** A checked upload: its fields, the file's text read by the engine, and the summary to store. */
export interface ReadUpload {
  fields: UploadMeasurementFields;
  summary: StoredSummary;
}

/** `line 17` → `file, line 17`; a problem with the whole file → `file`. */
export function fileProblemPath(p: FileProblem): Problem {
  return { path: p.line === null ? 'file' : `file, line ${p.line}`, message: p.message };
}

function decode(buffer: Buffer): string | null {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    return null;
  }
}

function readFile(fields: UploadMeasurementFields, text: string): { ok: true; value: StoredSummary } | { ok: false; problems: Problem[] } {
  const options = { maxBytes: MEASUREMENT_FILE_LIMIT };
  if (fields.kind === 'grid') {
    const context = {
      areaM2: fields.areaM2 === undefined ? undefined : as<SquareMetres>(fields.areaM2),
      wallWatts: fields.wallWatts === undefined ? undefined : as<Watts>(fields.wallWatts),
    };
    const read = readPpfdGrid(text, context, options);
    return read.ok ? { ok: true, value: storedGrid(read.value) } : { ok: false, problems: read.problems.map(fileProblemPath) };
  }
  const read = readSpectrum(text, fields.unit ?? 'w', options);
  return read.ok ? { ok: true, value: storedSpectrum(read.value) } : { ok: false, problems: read.problems.map(fileProblemPath) };
}

/**
 * Checks the form fields and reads the file with the engine. Every problem of the fields and of the
 * file comes back at once as one 400 whose fields name `file, line N` for the file's lines.
 */
export function readUpload(body: unknown, file: UploadedFile | undefined): ReadUpload {
  const checked = check(uploadMeasurementFieldsSchema, body ?? {});
  const problems: Problem[] = checked.ok ? [] : checked.problems;
  if (!file) problems.push({ path: 'file', message: 'is required: choose a CSV file to upload' });
  const text = file ? decode(file.buffer) : null;
  if (file && text === null) problems.push({ path: 'file', message: 'is not UTF-8 text; save the file as CSV (UTF-8) and try again' });
  // the file's lines are checked even when other fields are wrong, so one reply names everything
  const fields = checked.ok ? checked.value : readableFields(body);
  if (fields && text !== null) {
    const read = readFile(fields, text);
    if (!read.ok) problems.push(...read.problems);
    else if (checked.ok && problems.length === 0) return { fields: checked.value, summary: read.value };
  }
  throw new AppError('invalid_input', 'The measurement was not stored: some fields or lines of the file are not valid.', problems);
}

/** Enough of wrong fields to read the file by: its kind and, for a spectrum, a unit (the line checks do not depend on it). */
function readableFields(body: unknown): UploadMeasurementFields | null {
  const raw = (body ?? {}) as Record<string, unknown>;
  const kind = measurementKindSchema.safeParse(raw.kind);
  if (!kind.success) return null;
  const unit = spectrumUnitSchema.safeParse(raw.unit);
  return { kind: kind.data, unit: unit.success ? unit.data : 'w' };
}
