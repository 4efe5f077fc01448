import { z } from './zod-messages';
import { optionIdSchema, orRequired } from './scenario';

/** Most values along one axis of a sweep; 200 × 200 cells at most. */
export const SWEEP_MAX_STEPS = 200;
/** Highest electricity price a sweep or a break-even search considers, per kWh. */
export const MAX_PRICE_PER_KWH = 100;
/** Highest efficacy multiplier a sweep or a break-even search considers. */
export const MAX_EFFICACY_FACTOR = 10;
/** Most draws of one uncertainty run. */
export const MAX_DRAWS = 1_000_000;

const num = (what = 'a number') => z.number({ error: orRequired(`must be ${what}`) });
const steps = num('a whole number').int({ error: 'must be a whole number' })
  .gte(1, { error: 'must be at least 1' })
  .lte(SWEEP_MAX_STEPS, { error: `must be at most ${SWEEP_MAX_STEPS}` });

const axis = (lo: z.ZodNumber, hi: z.ZodNumber) =>
  z.strictObject({ lo, hi, n: steps }).superRefine((a, ctx) => {
    if (a.hi < a.lo) ctx.addIssue({ code: 'custom', path: ['hi'], message: `must be at least LO (${a.lo})` });
    if (a.n === 1 && a.hi !== a.lo) ctx.addIssue({ code: 'custom', path: ['n'], message: 'must be at least 2 when LO and HI differ' });
  });

/** Electricity prices of a sweep: n values evenly spaced from lo to hi, per kWh. */
export const tariffAxisSchema = axis(
  num().gte(0, { error: 'must be at least 0 per kWh' }),
  num().lte(MAX_PRICE_PER_KWH, { error: `must be at most ${MAX_PRICE_PER_KWH} per kWh` }),
);

/** Efficacy multipliers of a sweep: n values evenly spaced from lo to hi; 1 = as entered. */
export const efficacyAxisSchema = axis(
  num().gt(0, { error: 'must be greater than 0' }),
  num().lte(MAX_EFFICACY_FACTOR, { error: `must be at most ${MAX_EFFICACY_FACTOR}` }),
);

/** A two-way sweep: electricity price × efficacy multiplier on the option `vary`. */
export const sweepSettingsSchema = z.strictObject({
  vary: optionIdSchema,
  tariff: tariffAxisSchema,
  efficacy: efficacyAxisSchema,
});
export type SweepSettings = z.output<typeof sweepSettingsSchema>;
export type SweepAxis = SweepSettings['tariff'];

/** What a swing is measured on: one option's present value, or the gap a − b between two. */
export const swingMeasureSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('option'), id: optionIdSchema }),
  z.strictObject({ kind: z.literal('gap'), a: optionIdSchema, b: optionIdSchema }),
], { error: orRequired('must be { kind: "option", id } or { kind: "gap", a, b }') });
export type SwingMeasure = z.output<typeof swingMeasureSchema>;

/** One-at-a-time swings: every numeric input moved down and up by pct %. */
export const swingSettingsSchema = z.strictObject({
  pct: num().gt(0, { error: 'must be greater than 0 %' }).lt(100, { error: 'must be less than 100 %' }).default(20),
  /** ranking measure; the baseline's present value when absent */
  measure: swingMeasureSchema.optional(),
});
export type SwingSettings = z.output<typeof swingSettingsSchema>;

/** One drawn input: a field path of the scenario and its low, likely and high values (triangular). */
export const uncertainInputSchema = z
  .strictObject({
    path: z.string({ error: orRequired('must be text') })
      .regex(/^[A-Za-z][A-Za-z0-9]*(\[\d+\]|\.[A-Za-z][A-Za-z0-9]*)*$/, { error: 'must be a field path such as options[0].photonEfficacy' }),
    low: num(),
    likely: num(),
    high: num(),
  })
  .superRefine((r, ctx) => {
    if (r.likely < r.low) ctx.addIssue({ code: 'custom', path: ['likely'], message: `must be at least low (${r.low})` });
    if (r.high < r.likely) ctx.addIssue({ code: 'custom', path: ['high'], message: `must be at least likely (${r.likely})` });
  });
export type UncertainInput = z.output<typeof uncertainInputSchema>;

/** An uncertainty run: which inputs are drawn, how many draws, and the seed that makes it repeatable. */
export const uncertaintySettingsSchema = z
  .strictObject({
    seed: num('a whole number').int({ error: 'must be a whole number' })
      .gte(0, { error: 'must be at least 0' }).lte(0xffffffff, { error: 'must be at most 4294967295' }),
    draws: num('a whole number').int({ error: 'must be a whole number' })
      .gte(1, { error: 'must be at least 1' }).lte(MAX_DRAWS, { error: `must be at most ${MAX_DRAWS}` })
      .default(10_000),
    inputs: z.array(uncertainInputSchema, { error: orRequired('must be a list of inputs') })
      .min(1, { error: 'needs at least one input' }).max(64, { error: 'must have at most 64 inputs' }),
  })
  .superRefine((u, ctx) => {
    const seen = new Set<string>();
    u.inputs.forEach((r, i) => {
      if (seen.has(r.path)) ctx.addIssue({ code: 'custom', path: ['inputs', i, 'path'], message: `repeats "${r.path}"; each input is drawn once` });
      seen.add(r.path);
    });
  });
export type UncertaintySettings = z.output<typeof uncertaintySettingsSchema>;

/** Break-even electricity price between options a and b. */
export const breakevenPriceSettingsSchema = z
  .strictObject({ a: optionIdSchema, b: optionIdSchema })
  .refine((s) => s.a !== s.b, { path: ['b'], error: 'must differ from a' });
export type BreakevenPriceSettings = z.output<typeof breakevenPriceSettingsSchema>;

/** Break-even efficacy multiplier of option `vary` against option `against`, searched in [lo, hi]. */
export const breakevenEfficacySettingsSchema = z
  .strictObject({
    vary: optionIdSchema,
    against: optionIdSchema,
    lo: num().gt(0, { error: 'must be greater than 0' }).default(0.1),
    hi: num().lte(MAX_EFFICACY_FACTOR, { error: `must be at most ${MAX_EFFICACY_FACTOR}` }).default(MAX_EFFICACY_FACTOR),
  })
  .superRefine((s, ctx) => {
    if (s.vary === s.against) ctx.addIssue({ code: 'custom', path: ['against'], message: 'must differ from vary' });
    if (s.hi <= s.lo) ctx.addIssue({ code: 'custom', path: ['hi'], message: `must be greater than lo (${s.lo})` });
  });
export type BreakevenEfficacySettings = z.output<typeof breakevenEfficacySettingsSchema>;
