import { z } from './zod-messages';
import { moneySchema } from './money';

/** Format tag of a scenario file, version 1. */
export const SCENARIO_FORMAT = 'photon-parity/scenario@1';

/**
 * The theoretical ceiling of photon efficacy over 400–700 nm: every joule turned into 700 nm photons,
 * λ / (h·c·N_A) with the CODATA 2018 exact constants, ≈ 5.85 µmol/J. A value above it is a typo.
 */
export const MAX_PHOTON_EFFICACY = 5.85;

/** An error message for a wrong value that says "is required" when the value is missing instead. */
export const orRequired = (message: string) => (iss: { input?: unknown }) => (iss.input === undefined ? 'is required' : message);
const num = (what = 'a number') => z.number({ error: orRequired(`must be ${what}`) });
const positive = (max: number, unit: string) =>
  num().gt(0, { error: 'must be greater than 0' }).lte(max, { error: `must be at most ${max} ${unit}`.trim() });
const pct = (label = '') =>
  num().gte(0, { error: 'must be at least 0 %' }).lte(100, { error: `must be at most 100 %${label}` });
const text = (max: number) =>
  z.string({ error: orRequired('must be text') })
    .trim()
    .min(1, { error: 'must not be empty' })
    .max(max, { error: `must be at most ${max} characters` });

export const technologySchema = z.enum(['hps', 'mh', 'cmh', 'led', 'fluorescent', 'other'], {
  error: orRequired('must be one of hps, mh, cmh, led, fluorescent, other'),
});
export type Technology = z.infer<typeof technologySchema>;

export const lampSchema = z.strictObject({
  price: moneySchema,
  replaceEveryHours: positive(1_000_000, 'h'),
  outputAtReplacementPct: num().gt(0, { error: 'must be greater than 0 %' }).lte(100, { error: 'must be at most 100 %' }),
});

export const spectrumSummarySchema = z.strictObject({
  bluePct: pct(),
  greenPct: pct(),
  redPct: pct(),
  farRedPct: num().gte(0, { error: 'must be at least 0 %' }).lte(200, { error: 'must be at most 200 % of PAR' }),
  cctK: num().gte(1000, { error: 'must be at least 1000 K' }).lte(25000, { error: 'must be at most 25000 K' }).optional(),
});

export const optionIdSchema = z
  .string({ error: orRequired('must be text') })
  .regex(/^[a-z0-9-]{1,40}$/, { error: orRequired('must be 1 to 40 characters of a–z, 0–9 and hyphens') });

export const optionSchema = z
  .strictObject({
    id: optionIdSchema,
    label: text(120),
    technology: technologySchema,
    wallWatts: positive(100_000, 'W'),
    photonEfficacy: num()
      .gt(0, { error: 'must be greater than 0' })
      .lte(MAX_PHOTON_EFFICACY, { error: `must be at most ${MAX_PHOTON_EFFICACY} µmol/J, the physical limit for 400–700 nm` })
      .optional(),
    ppf: positive(10_000_000, 'µmol/s').optional(),
    owned: z.boolean({ error: orRequired('must be true or false') }).default(false),
    fixturePrice: moneySchema.optional(),
    installPrice: moneySchema.default('0'),
    rebate: moneySchema.default('0'),
    lamp: lampSchema.optional(),
    outputAtHorizonPct: num().gt(0, { error: 'must be greater than 0 %' }).lte(100, { error: 'must be at most 100 %' }).default(100),
    spectrum: spectrumSummarySchema.optional(),
  })
  .superRefine((o, ctx) => {
    const given = (o.photonEfficacy !== undefined ? 1 : 0) + (o.ppf !== undefined ? 1 : 0);
    if (given !== 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['photonEfficacy'],
        message: given === 0 ? 'give photonEfficacy (µmol/J) or ppf (µmol/s)' : 'give photonEfficacy or ppf, not both',
      });
    }
    if (o.ppf !== undefined && o.ppf / o.wallWatts > MAX_PHOTON_EFFICACY) {
      ctx.addIssue({
        code: 'custom',
        path: ['ppf'],
        message: `ppf / wallWatts must be at most ${MAX_PHOTON_EFFICACY} µmol/J, the physical limit for 400–700 nm`,
      });
    }
    if (!o.owned && o.fixturePrice === undefined) {
      ctx.addIssue({ code: 'custom', path: ['fixturePrice'], message: 'is required unless the option is owned' });
    }
  });
export type OptionInput = z.input<typeof optionSchema>;
export type Option = z.output<typeof optionSchema>;

export const scheduleRowSchema = z.strictObject({
  label: text(60),
  hoursPerDay: num().gt(0, { error: 'must be greater than 0 h' }).lte(24, { error: 'must be at most 24 h' }),
  daysPerYear: num().gt(0, { error: 'must be greater than 0 days' }).lte(366, { error: 'must be at most 366 days' }),
});

export const targetSchema = z
  .strictObject({
    ppfd: positive(3000, 'µmol m⁻² s⁻¹').optional(),
    dli: positive(100, 'mol m⁻² d⁻¹').optional(),
  })
  .refine((t) => (t.ppfd === undefined) !== (t.dli === undefined), { error: orRequired('give ppfd or dli, exactly one of them') });

export const scenarioSchema = z
  .strictObject({
    format: z.literal(SCENARIO_FORMAT, { error: orRequired(`must be "${SCENARIO_FORMAT}"`) }),
    title: text(200),
    currency: z.string({ error: orRequired('must be text') }).regex(/^[A-Z]{3}$/, { error: orRequired('must be a three-letter ISO 4217 code such as EUR') }),
    canopy: z.strictObject({ lengthM: positive(1000, 'm'), widthM: positive(1000, 'm') }),
    target: targetSchema,
    schedule: z.array(scheduleRowSchema, { error: orRequired('must be a list of growth phases') })
      .min(1, { error: 'needs at least one growth phase' })
      .max(12, { error: 'must have at most 12 growth phases' }),
    utilization: num().gt(0, { error: 'must be greater than 0' }).lte(1, { error: 'must be at most 1' }).default(1),
    levelAt: z.enum(['initial', 'maintained'], { error: orRequired('must be "initial" or "maintained"') }).default('initial'),
    fixtureCount: z.enum(['exact', 'whole'], { error: orRequired('must be "exact" or "whole"') }).default('exact'),
    horizonYears: num('a whole number of years').int({ error: 'must be a whole number of years' })
      .gte(1, { error: 'must be at least 1 year' }).lte(30, { error: 'must be at most 30 years' }),
    discountRatePct: num().gte(0, { error: 'must be at least 0 %' }).lte(100, { error: 'must be at most 100 %' }).default(0),
    electricity: z.strictObject({
      pricePerKwh: moneySchema,
      escalationPctPerYear: num().gte(-50, { error: 'must be at least -50 %' }).lte(50, { error: 'must be at most 50 %' }).default(0),
      demandChargePerKwMonth: moneySchema.default('0'),
    }),
    cooling: z.strictObject({
      cop: num().gt(0, { error: 'must be greater than 0' }).lte(20, { error: 'must be at most 20' }),
      share: num().gte(0, { error: 'must be at least 0' }).lte(1, { error: 'must be at most 1' }),
    }).optional(),
    baseline: optionIdSchema,
    options: z.array(optionSchema, { error: orRequired('must be a list of options') })
      .min(1, { error: 'needs at least one option' })
      .max(24, { error: 'must have at most 24 options' }),
  })
  .superRefine((s, ctx) => {
    const seen = new Set<string>();
    s.options.forEach((o, i) => {
      if (seen.has(o.id)) ctx.addIssue({ code: 'custom', path: ['options', i, 'id'], message: `repeats the id "${o.id}"; ids must be unique` });
      seen.add(o.id);
    });
    if (!seen.has(s.baseline)) {
      ctx.addIssue({ code: 'custom', path: ['baseline'], message: `must be the id of one of the options (no option "${s.baseline}")` });
    }
    if (s.target.dli !== undefined && s.schedule.length !== 1) {
      ctx.addIssue({ code: 'custom', path: ['target', 'dli'], message: 'a DLI target needs exactly one growth phase, whose hours per day set the photoperiod' });
    }
    const days = s.schedule.reduce((sum, row) => sum + row.daysPerYear, 0);
    if (days > 366) {
      ctx.addIssue({ code: 'custom', path: ['schedule'], message: `the phases add up to ${days} days; a year has at most 366` });
    }
  });

/** A scenario as written in a file (money as text or numbers, defaults omitted). */
export type ScenarioInput = z.input<typeof scenarioSchema>;
/** A validated scenario: defaults filled in, money as canonical decimal text. */
export type Scenario = z.output<typeof scenarioSchema>;
