import { z } from '../zod-messages';

const draft = z.string().max(40, { error: 'must be at most 40 characters' });
const id = z.string().max(40, { error: 'must be at most 40 characters' });

/**
 * The sensitivity settings kept with a scenario (format version 1): sweep ranges, swing size and
 * measure, the break-even pair, and the uncertainty ranges with the seed, so that anyone who opens
 * the scenario reruns the same draws. Values are kept as typed (text), because a half-typed range is
 * still worth keeping; the analysis forms validate them before a run.
 */
export const analysisSettingsSchema = z.strictObject({
  version: z.literal(1),
  sweep: z.strictObject({ vary: id, tariffLo: draft, tariffHi: draft, tariffN: draft, factorLo: draft, factorHi: draft, factorN: draft, showValueOf: id }),
  swings: z.strictObject({ pct: draft, measure: z.enum(['option', 'gap']), a: id, b: id }),
  breakeven: z.strictObject({ a: id, b: id }),
  uncertainty: z.strictObject({
    seed: draft,
    draws: draft,
    inputs: z
      .array(z.strictObject({ path: z.string().max(80, { error: 'must be at most 80 characters' }), low: draft, likely: draft, high: draft }))
      .max(100, { error: 'must have at most 100 inputs' }),
  }),
});
export type AnalysisSettings = z.infer<typeof analysisSettingsSchema>;

/** GET/PUT /api/workspaces/:wid/scenarios/:sid/analysis: `settings` is null until someone saves them. */
export const analysisResponseSchema = z.object({
  settings: analysisSettingsSchema.nullable(),
  updatedAt: z.string().nullable(),
});
export type AnalysisResponse = z.infer<typeof analysisResponseSchema>;

/** PUT body: the settings to keep with the scenario (editors and owners). */
export const saveAnalysisRequestSchema = z.strictObject({ settings: analysisSettingsSchema });
