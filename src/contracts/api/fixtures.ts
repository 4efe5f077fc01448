import { z } from '../zod-messages';
import { optionSchema, orRequired } from '../scenario';
import { idSchema, instantSchema, userRefSchema } from './common';

/** Where a fixture's figures come from: the maker's datasheet, our own measurement, or an estimate. */
export const dataSourceSchema = z.enum(['datasheet', 'measured', 'estimate'], {
  error: orRequired('must be one of datasheet, measured, estimate'),
});
export type DataSource = z.infer<typeof dataSourceSchema>;

const o = optionSchema.shape;

/**
 * The fields of a library entry: those of a scenario option (the option's `id` is called `key`
 * here and becomes the option id when the fixture is added to a scenario), plus where the data
 * came from and free notes. Money is decimal text.
 */
const fixtureFields = {
  key: o.id,
  label: o.label,
  technology: o.technology,
  wallWatts: o.wallWatts,
  photonEfficacy: o.photonEfficacy,
  ppf: o.ppf,
  owned: o.owned,
  fixturePrice: o.fixturePrice,
  installPrice: o.installPrice,
  rebate: o.rebate,
  lamp: o.lamp,
  outputAtHorizonPct: o.outputAtHorizonPct,
  spectrum: o.spectrum,
  dataSource: dataSourceSchema.default('datasheet'),
  notes: z.string({ error: 'must be text' }).trim().max(2000, { error: 'must be at most 2000 characters' }).default(''),
};

/** The scenario option a library entry stands for. */
export function optionFromFixture(f: FixtureFields): z.input<typeof optionSchema> {
  const { key, dataSource: _source, notes: _notes, ...rest } = f;
  return { id: key, ...rest };
}

/** A library entry's own fields, checked as a whole: exactly one of photonEfficacy and ppf, a price unless owned. */
export const fixtureFieldsSchema = z.strictObject(fixtureFields).superRefine((f, ctx) => {
  const asOption = optionSchema.safeParse(optionFromFixture(f));
  if (asOption.success) return;
  // Field rules were already checked above; only the option's cross-field rules are added here.
  for (const issue of asOption.error.issues.filter((i) => i.code === 'custom')) {
    const path = issue.path[0] === 'id' ? ['key', ...issue.path.slice(1)] : issue.path;
    ctx.addIssue({ code: 'custom', path: path as PropertyKey[], message: issue.message });
  }
});
export type FixtureFields = z.output<typeof fixtureFieldsSchema>;
export type FixtureFieldsInput = z.input<typeof fixtureFieldsSchema>;

/** POST /api/workspaces/:wid/fixtures (editors and owners). */
export const createFixtureRequestSchema = fixtureFieldsSchema;

/**
 * PATCH /api/workspaces/:wid/fixtures/:fid (editors and owners): the fields to change; `null`
 * removes an optional one (for example `photonEfficacy: null` with a new `ppf`). The merged entry
 * is checked as a whole.
 */
export const updateFixtureRequestSchema = z
  .strictObject({
    key: o.id.optional(),
    label: o.label.optional(),
    technology: o.technology.optional(),
    wallWatts: o.wallWatts.optional(),
    photonEfficacy: o.photonEfficacy.unwrap().nullable().optional(),
    ppf: o.ppf.unwrap().nullable().optional(),
    owned: o.owned.unwrap().optional(),
    fixturePrice: o.fixturePrice.unwrap().nullable().optional(),
    installPrice: o.installPrice.unwrap().optional(),
    rebate: o.rebate.unwrap().optional(),
    lamp: o.lamp.unwrap().nullable().optional(),
    outputAtHorizonPct: o.outputAtHorizonPct.unwrap().optional(),
    spectrum: o.spectrum.unwrap().nullable().optional(),
    dataSource: dataSourceSchema.optional(),
    notes: fixtureFields.notes.unwrap().optional(),
  })
  .refine((b) => Object.keys(b).length > 0, { error: 'give at least one field to change' });
export type UpdateFixtureRequest = z.input<typeof updateFixtureRequestSchema>;

/** A library entry as stored. */
export const fixtureSchema = z.object({
  id: idSchema,
  workspaceId: idSchema,
  ...fixtureFields,
  /** the measurement whose figures this entry carries (dataSource `measured`), if any */
  measurementId: idSchema.nullable().default(null),
  createdAt: instantSchema,
  updatedAt: instantSchema,
  updatedBy: userRefSchema,
});
export type Fixture = z.infer<typeof fixtureSchema>;

export const fixtureResponseSchema = z.object({ fixture: fixtureSchema });
/** GET /api/workspaces/:wid/fixtures: the whole library, ordered by label. */
export const fixtureListResponseSchema = z.object({ fixtures: z.array(fixtureSchema) });

/**
 * Columns of the fixture CSV (import and export), in this order. Nested option fields are
 * flattened: `lampPrice` is `lamp.price`, `bluePct` is `spectrum.bluePct`. An empty cell means
 * "not given". The header row is required; columns may come in any order; unknown columns are refused.
 */
export const FIXTURE_CSV_COLUMNS = [
  'key', 'label', 'technology', 'wallWatts', 'photonEfficacy', 'ppf', 'owned',
  'fixturePrice', 'installPrice', 'rebate',
  'lampPrice', 'lampReplaceEveryHours', 'lampOutputAtReplacementPct', 'outputAtHorizonPct',
  'bluePct', 'greenPct', 'redPct', 'farRedPct', 'cctK',
  'dataSource', 'notes',
] as const;
export type FixtureCsvColumn = (typeof FIXTURE_CSV_COLUMNS)[number];

/** Most data lines one import may hold. */
export const FIXTURE_IMPORT_MAX_LINES = 2000;

/**
 * POST /api/workspaces/:wid/fixtures/import (body `text/csv`): a line whose key is already in the
 * library updates that entry, any other line adds one. When any line is wrong nothing is stored
 * and the 400 reply names every wrong line (`line 17, wallWatts`).
 */
export const fixtureImportResponseSchema = z.object({
  created: z.number().int(),
  updated: z.number().int(),
  fixtures: z.array(fixtureSchema),
});
export type FixtureImportResponse = z.infer<typeof fixtureImportResponseSchema>;
export type UpdateFixtureRequestSchemaOutput = z.output<typeof updateFixtureRequestSchema>;
