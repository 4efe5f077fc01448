import { z } from '../zod-messages';
import { orRequired } from '../scenario';
import { idSchema, instantSchema, userRefSchema } from './common';
import { fixtureSchema } from './fixtures';

/** What a measurement file holds: a grid of PPFD readings over a canopy, or a spectrum. */
export const measurementKindSchema = z.enum(['grid', 'spectrum'], { error: orRequired('must be grid or spectrum') });
export type MeasurementKind = z.infer<typeof measurementKindSchema>;

/** Unit of a spectrum's values: W m⁻² nm⁻¹, µmol m⁻² s⁻¹ nm⁻¹, or relative spectral power. */
export const spectrumUnitSchema = z.enum(['w', 'umol', 'relative'], { error: orRequired('must be one of w, umol, relative') });

/** Largest measurement file accepted, bytes (2 MB, the engine's default limit). */
export const MEASUREMENT_FILE_LIMIT = 2_000_000;

/** A form field: empty text means "not given". */
const blankIsMissing = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);
const formNumber = (max: number, unit: string) =>
  z.preprocess(
    blankIsMissing,
    z.coerce
      .number({ error: 'must be a number' })
      .refine(Number.isFinite, { error: 'must be a number' })
      .gt(0, { error: 'must be greater than 0' })
      .lte(max, { error: `must be at most ${max} ${unit}` })
      .optional(),
  );

/**
 * The text fields of POST /api/workspaces/:wid/measurements (multipart/form-data, the file in the
 * field `file`). A spectrum needs its unit; a grid may give the area it covers and the wall watts
 * of the lamps lighting it. The label defaults to the file's name.
 */
export const uploadMeasurementFieldsSchema = z
  .strictObject({
    kind: measurementKindSchema,
    label: z.preprocess(blankIsMissing, z.string().trim().max(120, { error: 'must be at most 120 characters' }).optional()),
    unit: z.preprocess(blankIsMissing, spectrumUnitSchema.optional()),
    areaM2: formNumber(100_000, 'm²'),
    wallWatts: formNumber(10_000_000, 'W'),
    fixtureId: z.preprocess(blankIsMissing, idSchema.optional()),
  })
  .superRefine((f, ctx) => {
    if (f.kind === 'spectrum' && f.unit === undefined) ctx.addIssue({ code: 'custom', path: ['unit'], message: 'is required for a spectrum: w, umol or relative' });
    if (f.kind === 'grid' && f.unit !== undefined) ctx.addIssue({ code: 'custom', path: ['unit'], message: 'is only for spectra' });
    if (f.kind === 'spectrum') {
      for (const field of ['areaM2', 'wallWatts'] as const) {
        if (f[field] !== undefined) ctx.addIssue({ code: 'custom', path: [field], message: 'is only for grids' });
      }
    }
  });
export type UploadMeasurementFields = z.output<typeof uploadMeasurementFieldsSchema>;

/** `photon-parity/grid@1` (../shared/spec/cli.md): PPFD in µmol m⁻² s⁻¹, ratios as fractions. */
export const gridDocumentSchema = z.object({
  format: z.literal('photon-parity/grid@1'),
  rows: z.number().int(),
  cols: z.number().int(),
  count: z.number().int(),
  mean: z.number(),
  min: z.number(),
  max: z.number(),
  minOverMean: z.number(),
  minOverMax: z.number(),
  /** population standard deviation / mean */
  cv: z.number(),
  /** µmol/s */
  canopyFlux: z.number().optional(),
  /** µmol/J */
  efficacyAtCanopy: z.number().optional(),
});
export type GridDocumentWire = z.infer<typeof gridDocumentSchema>;

/** `photon-parity/spectrum@1` (../shared/spec/cli.md). */
export const spectrumDocumentSchema = z.object({
  format: z.literal('photon-parity/spectrum@1'),
  ppfd: z.number().nullable(),
  sharesPct: z.object({ blue: z.number(), green: z.number(), red: z.number(), farRed: z.number() }),
  cie1931: z.object({ x: z.number(), y: z.number() }).nullable(),
  cctK: z.number().nullable(),
  ypfdRatio: z.number(),
  redFarRedRatio: z.number().nullable(),
});
export type SpectrumDocumentWire = z.infer<typeof spectrumDocumentSchema>;

/** A library fixture named beside a measurement. */
export const fixtureRefSchema = z.object({ id: idSchema, label: z.string() });

/** A stored measurement without its bulky data: the figures, the file's name, size and SHA-256, and its links. */
export const measurementSchema = z.object({
  id: idSchema,
  workspaceId: idSchema,
  kind: measurementKindSchema,
  label: z.string(),
  fileName: z.string(),
  byteSize: z.number().int(),
  /** SHA-256 of the raw file as uploaded, lower-case hex */
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  unit: spectrumUnitSchema.nullable(),
  areaM2: z.number().nullable(),
  wallWatts: z.number().nullable(),
  /** the fixture the file was taken from, if named */
  fixture: fixtureRefSchema.nullable(),
  /** fixtures whose figures were set from this measurement */
  feeds: z.array(fixtureRefSchema),
  grid: gridDocumentSchema.nullable(),
  spectrum: spectrumDocumentSchema.nullable(),
  /** sentences about how the file was read (readings below zero counted as 0, …) */
  notes: z.array(z.string()),
  engineVersion: z.string(),
  createdAt: instantSchema,
  createdBy: userRefSchema,
});
export type Measurement = z.infer<typeof measurementSchema>;

/** The data behind the pictures: the readings of a grid, the photon curve of a spectrum. */
export const measurementDataSchema = z.object({
  /** grid readings, cells[row][column], µmol m⁻² s⁻¹, with positions in metres when the file gave them */
  cells: z.array(z.array(z.number())).nullable(),
  xM: z.array(z.number()).nullable(),
  yM: z.array(z.number()).nullable(),
  /** spectrum: wavelengths, nm, and photons per nm (µmol m⁻² s⁻¹ nm⁻¹, or relative) */
  wavelengthNm: z.array(z.number()).nullable(),
  photons: z.array(z.number()).nullable(),
  /** distance from the Planckian locus in CIE 1960 (u, v) */
  duv: z.number().nullable(),
});
export type MeasurementData = z.infer<typeof measurementDataSchema>;

export const measurementResponseSchema = z.object({ measurement: measurementSchema });
/** GET /api/workspaces/:wid/measurements/:mid: the measurement and the data to draw it. */
export const measurementDetailResponseSchema = z.object({ measurement: measurementSchema, data: measurementDataSchema });
/** GET /api/workspaces/:wid/measurements: newest first. */
export const measurementListResponseSchema = z.object({ measurements: z.array(measurementSchema) });

/**
 * POST /api/workspaces/:wid/measurements/:mid/apply (editors and owners): a grid with wall watts and
 * area sets the fixture's photonEfficacy to the efficacy at the canopy (and drops its ppf); a spectrum
 * sets its spectrum summary. Either way the fixture's dataSource becomes `measured` with a link here.
 * Without fixtureId, the fixture the measurement names is used.
 */
export const applyMeasurementRequestSchema = z.strictObject({
  fixtureId: idSchema.optional(),
  /**
   * For a grid: the share of the fixture's photons that landed on the measured area, (0, 1]; 1 when
   * omitted. The fixture's efficacy becomes the canopy efficacy divided by it.
   */
  shareOnArea: z
    .number({ error: 'must be a number' })
    .gt(0, { error: 'must be greater than 0' })
    .lte(1, { error: 'must be at most 1 (all of the light)' })
    .optional(),
});
export type ApplyMeasurementRequest = z.infer<typeof applyMeasurementRequestSchema>;

/** Reply of POST …/measurements/:mid/apply: the fixture as now stored, and the measurement with its links. */
export const applyMeasurementResponseSchema = z.object({ fixture: fixtureSchema, measurement: measurementSchema });
export type ApplyMeasurementResponse = z.infer<typeof applyMeasurementResponseSchema>;
